import nodemailer from 'nodemailer'

export interface MailMessage {
  to: string
  subject: string
  text: string
  html?: string
}

/** Anything that can send a message: SMTP in the app, an in-memory outbox in tests. */
export interface Mailer {
  send(msg: MailMessage): Promise<void>
}

/** SMTP mailer from settings (the fake inbox at 127.0.0.1:1025 in development). */
export function createSmtpMailer(opts: { host: string; port: number; from: string; secure?: boolean }): Mailer {
  const transport = nodemailer.createTransport({
    host: opts.host,
    port: opts.port,
    secure: opts.secure ?? false,
    // The local fake service offers no valid certificate; production sets SMTP_* to a real relay.
    ignoreTLS: !opts.secure,
  })
  return {
    async send(msg) {
      await transport.sendMail({ from: opts.from, ...msg })
    },
  }
}

/** Keeps messages in memory: for tests. */
export function createMemoryMailer(): Mailer & { outbox: MailMessage[] } {
  const outbox: MailMessage[] = []
  return {
    outbox,
    async send(msg) {
      outbox.push(msg)
    },
  }
}
