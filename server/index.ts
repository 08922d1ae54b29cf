import { createApp } from './app'
import { loadConfig } from './config'
import { openDatabase } from './db/client'
import { createSmtpMailer } from './mail/transport'

// Entry point for `npm start` (scripts/start.sh runs migrations and the seed before this).
const config = loadConfig()
const handle = openDatabase(config.databaseUrl)
const mailer = createSmtpMailer({ host: config.smtpHost, port: config.smtpPort, from: config.mailFrom })
const { app } = createApp({ db: handle.db, config, mailer })

// A lost database connection must never take the process down; /api/health reports it instead.
process.on('unhandledRejection', (err) => console.error('[touchproof] unhandled rejection', err))

const server = app.listen(config.port, config.host, () => {
  console.log(`[touchproof] listening on http://${config.host}:${config.port}`)
})

function shutdown() {
  server.close(() => void handle.close().finally(() => process.exit(0)))
  setTimeout(() => process.exit(0), 5000).unref()
}
process.on('SIGTERM', shutdown)
process.on('SIGINT', shutdown)
