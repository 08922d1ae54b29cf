import { customType } from 'drizzle-orm/mysql-core'

/**
 * MEDIUMBLOB (up to 16 MiB) holding raw bytes as a Buffer. drizzle 0.45 has no blob column
 * types for MySQL; mysql2 returns BLOB columns as Buffers already, so no conversion is needed.
 */
export const mediumBlob = customType<{ data: Buffer; driverData: Buffer }>({
  dataType() {
    return 'mediumblob'
  },
})
