import { execFileSync } from 'node:child_process'
import { mkdtempSync, readFileSync, readdirSync } from 'node:fs'
import { tmpdir } from 'node:os'
import path from 'node:path'
import { fileURLToPath } from 'node:url'
import { expect, test, type Browser, type Page } from '@playwright/test'
import { DEMO_PASSWORD, MAIL_API, expectNoAxeViolations, signIn, snap } from './support'

/**
 * Schedule to sign-off, as the people do it: a designer imports the demo clinic's schedule,
 * batch-checks it with the progress bar and submits a sign; the reviewer pins a comment and
 * returns it; the designer fixes and resubmits; the reviewer signs off; the e-mails arrive in the
 * fake inbox; the PDF report is downloaded and read with poppler.
 */

const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..')
const SCHEDULE = path.join(ROOT, 'examples/harbor-point-schedule.csv')
const DESIGNER = 'designer@tidewater.example'
const REVIEWER = 'reviewer@tidewater.example'

// One long flow on 2 shared cores: import, batch check, two reviews, a proof, a PDF.
test.describe.configure({ timeout: 480_000 })

interface Mail {
  id: string
  subject: string
  text: string
  to: Array<{ address: string }>
}
/** Wait for a mail to `to` whose subject matches (polls the fake inbox; no fixed sleeps). */
async function waitForMailLike(to: string, subject: RegExp, timeoutMs = 15_000): Promise<Mail> {
  const deadline = Date.now() + timeoutMs
  for (;;) {
    const mails = (await (await fetch(MAIL_API)).json()) as Mail[]
    const hit = mails.find((m) => m.to.some((t) => t.address === to) && subject.test(m.subject))
    if (hit) return hit
    if (Date.now() > deadline) throw new Error(`no mail to ${to} matching ${subject} within ${timeoutMs} ms (have: ${mails.map((m) => m.subject).join(' | ')})`)
    await new Promise((r) => setTimeout(r, 250))
  }
}

const esc = (s: string) => s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')

async function check(page: Page, name: string) {
  await expectNoAxeViolations(page, name)
  await snap(page, name)
}

/** A second person in their own browser context. */
async function personPage(browser: Browser, email: string): Promise<Page> {
  const ctx = await browser.newContext()
  const page = await ctx.newPage()
  await signIn(page, email, DEMO_PASSWORD)
  return page
}

test('schedule import, batch check, review with a pinned comment, return, resubmit, sign-off, e-mails and the PDF report', async ({ page, browser }) => {
  const projectName = `Harbor Point Clinic, east wing ${Date.now().toString(36)}`
  await signIn(page, DESIGNER)
  const created = await page.request.post('/api/projects', { data: { name: projectName, address: '1 Harbor Point Way' }, headers: { Origin: new URL(page.url()).origin } })
  expect(created.status()).toBe(201)
  const projectId = (await created.json()).project.id as string
  await page.goto(`/projects/${projectId}`)
  await expect(page.getByRole('heading', { level: 1, name: projectName })).toBeVisible()

  // --- schedule import: a file with a bad row first (row-level problems, nothing written) ---
  await page.getByRole('button', { name: 'Import schedule' }).click()
  const dialog = page.getByRole('dialog', { name: 'Import sign schedule' })
  await dialog.getByLabel('Schedule file (CSV)').setInputFiles({
    name: 'bad.csv',
    mimeType: 'text/csv',
    buffer: Buffer.from('room_number,room_name,sign_type,door\n101,Exam Room,room-identification,single\n102,Exam Room,round-sign,revolving\n'),
  })
  const problems = dialog.getByTestId('schedule-problems')
  await expect(problems).toBeVisible()
  await expect(problems.getByRole('row', { name: /3 sign_type "round-sign" is not one of/ })).toBeVisible()
  await expect(problems.getByRole('row', { name: /3 door "revolving" must be single, double or empty/ })).toBeVisible()
  await expect(dialog.getByRole('button', { name: /^Import/ })).toBeDisabled()
  await check(page, 'review-01-schedule-problems')

  await dialog.getByLabel('Schedule file (CSV)').setInputFiles(SCHEDULE)
  await expect(dialog.getByTestId('schedule-rows')).toBeVisible()
  await expect(problems).toBeHidden()
  const rowCount = readFileSync(SCHEDULE, 'utf8').trim().split('\n').length - 1
  const importButton = dialog.getByRole('button', { name: `Import ${rowCount} signs` })
  await expect(importButton).toBeEnabled()
  await check(page, 'review-02-schedule-preview')
  await importButton.click()
  // 21 layouts with Grade 2 braille are built on the server: allow for busy shared cores.
  await expect(dialog).toBeHidden({ timeout: 90_000 })
  const table = page.getByTestId('sign-table')
  await expect(page.getByRole('heading', { level: 2, name: `Signs (${rowCount})` })).toBeVisible()
  await expect(table.getByRole('link', { name: 'Exam Room 101', exact: true })).toBeVisible()

  // --- batch check with the progress bar and a summary ---
  await page.getByRole('button', { name: 'Check all signs' }).click()
  const bar = page.getByTestId('batch-progress')
  await expect(bar).toBeVisible()
  await expect(page.getByTestId('batch-summary')).toBeVisible({ timeout: 120_000 })
  await expect(bar).toHaveAttribute('aria-valuenow', '100')
  await expect(page.getByRole('status').filter({ hasText: 'Batch check finished' })).toContainText(`${rowCount} of ${rowCount} signs checked`)
  // Every row now shows counts of the current revision's check (no "not checked" dashes left).
  await expect(table.getByText('Not checked yet')).toHaveCount(0)
  await check(page, 'review-03-batch-checked')

  // Filters and sorting: find by name, sort by sign name descending.
  await page.getByLabel('Find').fill('Exam Room 10')
  await expect(table.locator('tbody tr')).toHaveCount(6) // rooms 101 to 106
  const signHeader = table.getByRole('columnheader', { name: 'Sign', exact: true })
  await signHeader.click() // ascending → descending
  await expect(signHeader).toHaveAttribute('aria-sort', 'descending')
  await expect(table.locator('tbody tr').first()).toContainText('Exam Room 106')
  await page.getByLabel('Find').fill('')
  await expect(table.locator('tbody tr')).toHaveCount(rowCount)

  // --- submit one sign for review from the table ---
  const row = table.getByRole('row', { name: /Exam Room 101\b/ })
  await row.getByRole('checkbox', { name: 'Select Exam Room 101' }).check()
  await page.getByRole('button', { name: 'Submit for review (1)' }).click()
  await expect(row).toContainText('In review')
  await page.getByRole('combobox', { name: 'Status' }).click()
  await page.getByRole('option', { name: 'In review' }).click()
  await expect(table.locator('tbody tr')).toHaveCount(1)
  await page.getByRole('combobox', { name: 'Status' }).press('Escape')
  // Bulk submission sends one summary mail per reviewer, linking to the review queue.
  const requested = await waitForMailLike(REVIEWER, new RegExp(`^Review requested: 1 signs in ${esc(projectName)}`))
  expect(requested.text).toContain('Exam Room 101')
  const queueLink = /(http:\/\/\S+\/reviews)\b/.exec(requested.text)?.[1]
  expect(queueLink).toBeTruthy()

  // --- reviewer: queue, pinned comment, return ---
  const reviewer = await personPage(browser, REVIEWER)
  await reviewer.goto(queueLink!)
  await expect(reviewer.getByRole('heading', { level: 1, name: 'Reviews' })).toBeVisible()
  const queue = reviewer.getByTestId('review-queue')
  const queued = queue.getByRole('row', { name: new RegExp(`Exam Room 101.*${esc(projectName)}`) })
  await expect(queued).toBeVisible()
  await check(reviewer, 'review-04-queue')
  await queued.getByRole('link', { name: 'Exam Room 101' }).click()
  await expect(reviewer).toHaveURL(/\/projects\/[a-z0-9]+\/signs\/[a-z0-9]+\/review$/)
  const reviewLink = reviewer.url()
  await expect(reviewer.getByRole('heading', { level: 1, name: 'Review: Exam Room 101' })).toBeVisible()
  await expect(reviewer.getByTestId('review-findings-summary')).toBeVisible()
  // A finding shows its dimension on the drawing.
  await reviewer.getByRole('checkbox', { name: /Show “meets”/ }).check()
  await reviewer.getByRole('button', { name: /703\.3\.2\s+Braille 3\/8 in minimum from any other tactile characters/ }).first().click()
  await expect(reviewer.getByTestId('drawing-dimension')).toBeVisible()

  await reviewer.getByTestId('pin-mode').click()
  const drawing = reviewer.getByTestId('sign-drawing')
  const box = (await drawing.boundingBox())!
  await drawing.click({ position: { x: box.width * 0.3, y: box.height * 0.72 } })
  await reviewer.getByLabel('Comment', { exact: true }).fill('Braille sits tight under the room number: move it down 1/16 in and recheck.')
  await reviewer.getByRole('button', { name: 'Pin comment' }).click()
  await expect(reviewer.getByTestId('pin-1')).toBeVisible()
  await expect(reviewer.getByTestId('thread-1')).toContainText('move it down 1/16 in')
  await check(reviewer, 'review-05-pinned-comment')
  await reviewer.getByLabel('Comments to the designer').fill('See the pinned comment on the braille; otherwise fine.')
  await reviewer.getByRole('button', { name: 'Return with comments' }).click()
  await expect(reviewer.getByText('Returned', { exact: true }).first()).toBeVisible()
  const returned = await waitForMailLike(DESIGNER, /^Returned: Exam Room 101 \(revision 1\)/)
  expect(returned.text).toContain('See the pinned comment on the braille')

  // --- designer: reply, fix, resubmit ---
  await page.goto(reviewLink)
  await expect(page.getByRole('heading', { level: 1, name: 'Review: Exam Room 101' })).toBeVisible()
  await page.getByLabel('Reply to comment 1').fill('Moved down 1/16 in.')
  await page.getByTestId('thread-1').getByRole('button', { name: 'Reply' }).click()
  await expect(page.getByTestId('thread-1')).toContainText('Moved down 1/16 in.')
  // The fix itself is an edit of the layout (the editor has its own tests): one PATCH as the designer.
  const origin = new URL(page.url()).origin
  const signId = new URL(page.url()).pathname.split('/')[4]!
  const current = (await (await page.request.get(`/api/signs/${signId}`)).json()).sign
  const doc = structuredClone(current.document)
  doc.elements.find((e: { kind: string }) => e.kind === 'braille').position.y += 0.0625
  const patched = await page.request.patch(`/api/signs/${signId}`, { data: { version: current.version, document: doc }, headers: { Origin: origin } })
  expect(patched.status()).toBe(200)
  expect((await patched.json()).sign.revision).toBe(2)
  await page.reload()
  await expect(page.getByText('Revision 2', { exact: true })).toBeVisible()
  await page.getByRole('button', { name: 'Submit for review' }).click()
  await expect(page.getByText('In review', { exact: true }).first()).toBeVisible()
  const again = await waitForMailLike(REVIEWER, /^Review requested: Exam Room 101 \(revision 2\)/)
  expect(again.text).toContain(reviewLink)

  // --- reviewer signs off revision 2 ---
  await reviewer.goto(reviewLink)
  await expect(reviewer.getByRole('heading', { name: 'Decision on revision 2' })).toBeVisible()
  await reviewer.getByRole('button', { name: 'Sign off revision 2' }).click()
  const signoffs = reviewer.getByTestId('signoffs')
  await expect(signoffs).toContainText('Signed off: revision 2')
  await expect(signoffs).toContainText('Riley Reviewer')
  await expect(signoffs.locator('.review__hash')).toHaveText(/^[0-9a-f]{64}$/)
  await check(reviewer, 'review-06-signed-off')
  const signedMail = await waitForMailLike(DESIGNER, /^Signed off: Exam Room 101 \(revision 2\)/)
  expect(signedMail.text).toContain('Riley Reviewer signed off revision 2')

  // --- the PDF report, downloaded as a user does, read with poppler ---
  const [download] = await Promise.all([reviewer.waitForEvent('download'), reviewer.getByRole('link', { name: 'Download PDF report' }).click()])
  const dir = mkdtempSync(path.join(tmpdir(), 'tp-e2e-pdf-'))
  const pdfPath = path.join(dir, download.suggestedFilename())
  await download.saveAs(pdfPath)
  expect(download.suggestedFilename()).toBe('exam-room-101-r2-check-report.pdf')
  const text = execFileSync('pdftotext', ['-layout', pdfPath, '-']).toString()
  for (const s of ['Check report: Exam Room 101', 'Findings', '703.2.5', 'Table 703.3.1', '703.3.2', 'Signed off', 'Riley Reviewer', "matches this revision's document", 'authority having jurisdiction (AHJ)']) expect(text).toContain(s)
  execFileSync('pdftoppm', ['-png', '-r', '50', '-f', '1', '-l', '1', pdfPath, path.join(dir, 'page')])
  expect(readdirSync(dir).some((f) => f.startsWith('page') && f.endsWith('.png'))).toBe(true)

  await reviewer.context().close()

  // --- proof: the designer sends it, the client opens the link in a fresh context and approves ---
  const client = `client-${Date.now().toString(36)}@harbor-point.example`
  await page.goto(`/projects/${projectId}`)
  const signedRow = page.getByTestId('sign-table').getByRole('row', { name: /Exam Room 101\b/ })
  await expect(signedRow).toContainText('Signed off')
  await signedRow.getByRole('checkbox', { name: 'Select Exam Room 101' }).check()
  await page.getByRole('button', { name: 'Send proof (1)' }).click()
  const proofDialog = page.getByRole('dialog', { name: 'Send a proof to the client' })
  await proofDialog.getByLabel("Client's e-mail").fill(client)
  await proofDialog.getByLabel('Message (optional)').fill('Here is the exam room sign for your approval.')
  await check(page, 'review-07-send-proof')
  await proofDialog.getByRole('button', { name: 'Send proof' }).click()
  await expect(proofDialog).toBeHidden()
  await expect(page.getByTestId('proof-list')).toContainText('Waiting for the client')
  const proofMail = await waitForMailLike(client, /^Sign proof from Tidewater Tactile Signs/)
  const proofLink = /(http:\/\/\S+\/proof\/[A-Za-z0-9_-]+)/.exec(proofMail.text)?.[1]
  expect(proofLink).toBeTruthy()

  const clientCtx = await browser.newContext()
  const clientPage = await clientCtx.newPage()
  await clientPage.goto(proofLink!)
  await expect(clientPage.getByRole('heading', { level: 1, name: projectName })).toBeVisible()
  const proofSign = clientPage.getByTestId('proof-sign')
  await expect(proofSign).toHaveCount(1)
  await expect(proofSign).toContainText('EXAM ROOM / 101')
  await expect(proofSign).toContainText('0.75 in') // uppercase I height of the template (§703.2.5: 5/8 in to 2 in)
  await expect(proofSign.locator('.proof__braille')).toHaveText(/[\u2800-\u28ff]/)
  // The drawing's glyph outlines arrive from the engine worker.
  await expect(proofSign.locator('[data-testid="sign-drawing"] path[transform^="translate"]').first()).toBeAttached({ timeout: 30_000 })
  await check(clientPage, 'review-08-proof-page')
  await clientPage.getByLabel('Your name (optional)').fill('Jordan Client')
  await clientPage.getByRole('button', { name: 'Approve' }).click()
  await expect(clientPage.getByTestId('proof-answered')).toContainText('Approved')
  await check(clientPage, 'review-09-proof-approved')
  await clientCtx.close()
  const answeredMail = await waitForMailLike(DESIGNER, new RegExp(`^Proof approved: ${esc(projectName)}`))
  expect(answeredMail.text).toContain('Jordan Client')
  await page.reload()
  await expect(page.getByTestId('proof-list')).toContainText('Approved')
})

test('a failing revision needs a justification to be signed off; an edit afterwards shows "Superseded" everywhere', async ({ page, browser }) => {
  await signIn(page, DESIGNER)
  const origin = new URL(page.url()).origin
  const api = page.request
  const projectName = `Harbor Point Clinic, records wing ${Date.now().toString(36)}`
  const projectId = (await (await api.post('/api/projects', { data: { name: projectName }, headers: { Origin: origin } })).json()).project.id as string
  const created = await api.post(`/api/projects/${projectId}/signs`, { data: { name: 'Records 120', signType: 'room-identification', text: 'Records\n120' }, headers: { Origin: origin } })
  expect(created.status()).toBe(201)
  const sign = (await created.json()).sign
  // Planted fault: braille 0.14 in closer to the text, 0.25 in as measured, where §703.3.2 asks 3/8 in.
  const doc = structuredClone(sign.document)
  doc.elements.find((e: { kind: string }) => e.kind === 'braille').position.y -= 0.14
  const edited = (await (await api.patch(`/api/signs/${sign.id}`, { data: { version: sign.version, document: doc }, headers: { Origin: origin } })).json()).sign
  expect((await api.post(`/api/signs/${sign.id}/submit`, { data: { version: edited.version }, headers: { Origin: origin } })).status()).toBe(200)

  const reviewer = await personPage(browser, REVIEWER)
  await reviewer.goto(`/projects/${projectId}/signs/${sign.id}/review`)
  const decision = reviewer.getByTestId('decision-panel')
  await expect(decision).toContainText("The server's check finds 1 failing finding")
  const signOff = decision.getByRole('button', { name: 'Sign off revision 2' })
  await expect(signOff).toBeDisabled()
  await decision.getByLabel('Justification').fill('Too short.')
  await expect(signOff).toBeDisabled()
  await decision.getByLabel('Justification').fill('Accepted by the owner: braille gap 0.25 in matches the existing wing signs; AHJ to confirm.')
  await expect(signOff).toBeEnabled()
  await check(reviewer, 'review-10-justification')
  await signOff.click()
  const signoffs = reviewer.getByTestId('signoffs')
  await expect(signoffs).toContainText('Signed off: revision 2')
  await expect(signoffs).toContainText('1 fails, 2 advisory')
  await expect(signoffs).toContainText('Accepted by the owner: braille gap 0.25 in')
  await reviewer.context().close()

  // Any later edit makes a new revision: the sign-off stays for revision 2 and reads as superseded.
  const now = (await (await api.get(`/api/signs/${sign.id}`)).json()).sign
  const fixed = structuredClone(now.document)
  fixed.elements.find((e: { kind: string }) => e.kind === 'braille').position.y += 0.14
  expect((await api.patch(`/api/signs/${sign.id}`, { data: { version: now.version, document: fixed }, headers: { Origin: origin } })).status()).toBe(200)
  await page.goto(`/projects/${projectId}`)
  const row = page.getByTestId('sign-table').getByRole('row', { name: /Records 120/ })
  await expect(row).toContainText('Superseded')
  await check(page, 'review-11-project-superseded')
  await row.getByRole('link', { name: 'Review Records 120' }).click()
  await expect(page.getByTestId('superseded-banner')).toContainText('Revision 2 was signed off by Riley Reviewer')
  await expect(page.getByTestId('signoffs')).toContainText('Superseded: revision 2')
  await check(page, 'review-12-review-superseded')

  // The schedule export carries each sign's status.
  await page.goto(`/projects/${projectId}`)
  const [csv] = await Promise.all([page.waitForEvent('download'), page.getByRole('link', { name: 'Export schedule' }).click()])
  const csvText = readFileSync((await csv.path())!, 'utf8')
  expect(csvText).toMatch(/Records 120|Records,/)
  expect(csvText.toLowerCase()).toContain('superseded')

  // The project summary PDF says so too.
  const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('link', { name: 'Download project report' }).click()])
  const dir = mkdtempSync(path.join(tmpdir(), 'tp-e2e-pdf-'))
  const pdfPath = path.join(dir, 'project.pdf')
  await download.saveAs(pdfPath)
  const text = execFileSync('pdftotext', ['-layout', pdfPath, '-']).toString()
  expect(text).toContain(`Project summary: ${projectName}`)
  expect(text).toMatch(/Records 120\s+Room\s+Superseded\s+3/)
  expect(text).toContain('(superseded)')

  // A wrong proof link: a clear page, no account needed.
  const anon = await browser.newContext()
  const anonPage = await anon.newPage()
  await anonPage.goto('/proof/not-a-real-token-0123456789abcdef0123456789')
  await expect(anonPage.getByRole('heading', { level: 1, name: 'Proof not found' })).toBeVisible()
  await check(anonPage, 'review-13-proof-not-found')
  await anon.close()
})

test('demo clinic: the sign table shows the planted faults and filters to them', async ({ page }) => {
  await signIn(page, DESIGNER)
  await page.getByRole('table', { name: 'Projects' }).getByRole('link', { name: 'Harbor Point Community Clinic' }).click()
  const table = page.getByTestId('sign-table')
  // Seeded "Exam Room 103" has its braille 1/4 in under the text (§703.3.2 asks 3/8 in): its stored check fails.
  const faulty = table.getByRole('row', { name: /Exam Room 103/ })
  await expect(faulty.locator('.tp-status--fails')).toBeVisible()
  await page.getByText('With fails only').click()
  const shown = await table.locator('tbody tr').count()
  expect(shown).toBeGreaterThanOrEqual(1)
  await expect(table.getByRole('row', { name: /Exam Room 101\b/ })).toHaveCount(0)
  await check(page, 'review-14-demo-fails-only')
})
