import type { Auth } from './auth/lucia'
import type { Config } from './config'
import type { Database } from './db/client'
import type { Mailer } from './mail/transport'

/** Everything a route needs, injected by createApp so tests can swap parts (mailer, DB, limits). */
export interface AppDeps {
  db: Database
  /** Cheap round trip used by /api/health. */
  pingDb: () => Promise<void>
  config: Config
  mailer: Mailer
  auth: Auth
  log: (msg: string, err?: unknown) => void
}
