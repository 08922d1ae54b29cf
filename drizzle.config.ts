import { defineConfig } from 'drizzle-kit'

// `npm run db:generate` writes SQL migrations from the schema; no database needed.
// Never `drizzle-kit push`/`pull`: they crash on MariaDB once a CHECK constraint exists.
export default defineConfig({
  dialect: 'mysql',
  schema: './server/db/schema/index.ts',
  out: './server/db/migrations',
})
