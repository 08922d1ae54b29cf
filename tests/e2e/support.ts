import { mkdirSync } from 'node:fs'
import path from 'node:path'
import { fileURLToPath } from 'node:url'
import AxeBuilder from '@axe-core/playwright'
import { expect, type Page } from '@playwright/test'

const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..')
/** Screenshots of every view, for people to look at (gitignored). */
export const SCREENSHOT_DIR = path.join(ROOT, '.data/screenshots')
mkdirSync(SCREENSHOT_DIR, { recursive: true })

export const DEMO_PASSWORD = 'touchproof-demo'
export const MAIL_API = `http://127.0.0.1:${Number(process.env.E2E_MAIL_WEB_PORT ?? 1180)}/api/email`

/** Sign in through the form, as a person does. */
export async function signIn(page: Page, email: string, password = DEMO_PASSWORD) {
  await page.goto('/sign-in')
  await page.getByLabel('E-mail').fill(email)
  await page.getByLabel('Password', { exact: true }).fill(password)
  await page.getByRole('button', { name: 'Sign in' }).click()
  await expect(page.getByRole('heading', { level: 1, name: 'Projects' })).toBeVisible()
}

/** Run axe-core (WCAG 2.0–2.2 A/AA rules) and fail with the list of violations, if any. */
export async function expectNoAxeViolations(page: Page, label: string) {
  // @axe-core/playwright types against its own playwright-core copy; the runtime object is the same.
  const axePage = page as unknown as ConstructorParameters<typeof AxeBuilder>[0]['page']
  const results = await new AxeBuilder({ page: axePage }).withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa', 'wcag22aa', 'best-practice']).analyze()
  const summary = results.violations.map((v) => `${v.id} (${v.impact}): ${v.help} — ${v.nodes.map((n) => n.target.join(' ')).slice(0, 3).join(' | ')}`)
  expect(summary, `axe violations on ${label}`).toEqual([])
}

/** Full-page screenshot under .data/screenshots/<name>.png. */
export async function snap(page: Page, name: string) {
  await page.screenshot({ path: path.join(SCREENSHOT_DIR, `${name}.png`), fullPage: true, animations: 'disabled' })
}

interface MaildevMail {
  id: string
  subject: string
  text: string
  to: Array<{ address: string }>
}

/** Wait for a mail to `to` in the fake inbox and return it (polls; no fixed sleeps). */
export async function waitForMail(to: string, timeoutMs = 15_000): Promise<MaildevMail> {
  return (await waitForMails(to, 1, timeoutMs))[0]!
}

/** Wait until at least `count` mails to `to` arrived; returns them oldest first. */
export async function waitForMails(to: string, count: number, timeoutMs = 15_000): Promise<MaildevMail[]> {
  const deadline = Date.now() + timeoutMs
  for (;;) {
    const res = await fetch(MAIL_API)
    const mails = ((await res.json()) as MaildevMail[]).filter((m) => m.to.some((t) => t.address === to))
    if (mails.length >= count) return mails
    if (Date.now() > deadline) throw new Error(`${mails.length} of ${count} mails to ${to} within ${timeoutMs} ms`)
    await new Promise((r) => setTimeout(r, 200))
  }
}
