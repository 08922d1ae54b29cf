// npm run db:migrate — apply Drizzle migrations to DATABASE_URL (default: the local app database).
import { DEFAULT_DATABASE_URL } from '../server/config'
import { openDatabase } from '../server/db/client'
import { runMigrations } from '../server/db/migrate'

const url = process.env.DATABASE_URL ?? DEFAULT_DATABASE_URL
const handle = openDatabase(url, { connectionLimit: 1 })
const started = Date.now()
try {
  await runMigrations(handle.db)
  console.log(`[touchproof] migrations applied to ${new URL(url).pathname.slice(1)} in ${Date.now() - started} ms`)
} finally {
  await handle.close()
}
