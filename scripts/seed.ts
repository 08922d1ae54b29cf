// npm run db:seed — idempotent demo data (see server/seed/index.ts for the steps).
import { DEFAULT_DATABASE_URL } from '../server/config'
import { openDatabase } from '../server/db/client'
import { runSeed } from '../server/seed/index'

const url = process.env.DATABASE_URL ?? DEFAULT_DATABASE_URL
const handle = openDatabase(url, { connectionLimit: 2 })
try {
  await runSeed(handle.db, (m) => console.log(`[touchproof] ${m}`))
} finally {
  await handle.close()
}
