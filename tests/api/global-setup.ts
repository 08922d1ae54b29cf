import { openDatabase } from '../../server/db/client'
import { runMigrations } from '../../server/db/migrate'
import { TEST_DATABASE_URL } from './env'

/** Bring the test database's schema up to date once per run (re-running is a no-op). */
export default async function setup() {
  const handle = openDatabase(TEST_DATABASE_URL, { connectionLimit: 1 })
  try {
    await runMigrations(handle.db)
  } catch (e) {
    throw new Error(`API tests need MariaDB with the test database (run \`npm test\`, or \`npm start\` once): ${(e as Error).message}`)
  } finally {
    await handle.close()
  }
}
