import { expect, test, type Page } from '@playwright/test'
import { expectNoAxeViolations, signIn, snap } from './support'

/**
 * Lessons as the demo trainee: the braille lesson's annotated example with
 * measured callouts, switching to CBC 11B, fixing the planted braille-gap fault
 * in the practice sign, "Check my fix" → solved, progress; then the reviewer
 * sees the trainee's progress. Screenshots land in .data/screenshots.
 */

async function openBrailleLesson(page: Page) {
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Lessons' }).click()
  await expect(page.getByRole('heading', { level: 1, name: 'Lessons' })).toBeVisible()
  await page.getByRole('link', { name: '2. Braille' }).click()
  await expect(page.getByRole('heading', { level: 1, name: 'Braille' })).toBeVisible()
}

test('trainee: braille lesson callouts, CBC switch, practice fix solved, progress', async ({ page }) => {
  // Four axe scans and six full-page screenshots on two shared cores.
  test.setTimeout(240_000)
  await signIn(page, 'trainee@tidewater.example')
  await expect(page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Lessons' })).toBeVisible()
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Lessons' }).click()
  await expect(page.getByTestId('lesson-card-braille')).toBeVisible()
  await expectNoAxeViolations(page, 'lessons list')
  await snap(page, 'lessons-01-list')

  await page.getByRole('link', { name: '2. Braille' }).click()
  await expect(page.getByRole('heading', { level: 1, name: 'Braille' })).toBeVisible()
  // The Markdown was rendered with heading anchors.
  await expect(page.locator('h2#position-and-clear-space')).toHaveText('Position and clear space')

  // Annotated example: measured callouts from the engine.
  const lab = page.getByTestId('example-braille-lab-ada-only')
  await lab.scrollIntoViewIfNeeded()
  const spacing = lab.getByTestId('callout-braille.dot-spacing')
  await expect(spacing).toHaveAttribute('data-status', 'meets')
  await expect(spacing.getByTestId('callout-value')).toHaveText('0.094 in')
  await expect(spacing.getByTestId('callout-limit')).toHaveText('limit 0.09 in to 0.1 in')
  await expect(spacing).toContainText('Meets')
  await expect(spacing).toContainText('§ Table 703.3.1')
  const gap = lab.getByTestId('callout-braille.separation-text')
  await expect(gap.getByTestId('callout-value')).toHaveText('0.6 in')
  await expect(lab.getByTestId('callout-braille.separation-text-max')).toHaveAttribute('data-status', 'not-checked')
  await expect(lab.getByTestId('lesson-canvas').locator('canvas').first()).toBeVisible()
  await snap(page, 'lessons-02-braille-example-ada')
  await lab.screenshot({ path: '.data/screenshots/lessons-02b-braille-example-ada-card.png', animations: 'disabled' })

  // Toggle one callout off and on again.
  const box = lab.getByRole('checkbox', { name: /Cell to cell/ })
  await box.uncheck()
  await expect(box).not.toBeChecked()
  await box.check()

  // Switch to CBC 11B: the same measurement is now held to different limits.
  await lab.getByRole('button', { name: 'CBC 11B-2022' }).click()
  await expect(spacing).toHaveAttribute('data-status', 'fails')
  await expect(spacing.getByTestId('callout-limit')).toHaveText('limit exactly 0.1 in')
  await expect(spacing).toContainText('Fails')
  await expect(spacing).toContainText('§ Table 11B-703.3.1')
  const max = lab.getByTestId('callout-braille.separation-text-max')
  await expect(max).toHaveAttribute('data-status', 'fails')
  await expect(max.getByTestId('callout-limit')).toHaveText('limit 0.5 in maximum')
  await lab.screenshot({ path: '.data/screenshots/lessons-03-braille-example-cbc-card.png', animations: 'disabled' })
  await expectNoAxeViolations(page, 'braille lesson')
  await snap(page, 'lessons-03-braille-lesson-cbc')

  // Marked as read already when an earlier run used the same database.
  const mark = page.getByTestId('mark-read')
  if (await mark.isVisible()) await mark.click()
  await expect(page.getByTestId('lesson-read')).toBeVisible()

  // Practice: the planted braille-gap fault.
  await page.getByTestId('practice-card-braille-gap-practice').getByRole('link', { name: /practice/i }).click()
  await expect(page.getByRole('heading', { level: 1, name: 'Practice: Exam Room 2' })).toBeVisible()
  // A copy left over from an earlier run starts over, so the test always begins from the planted fault.
  await page.getByRole('button', { name: 'Start over' }).click()
  await expect(page.getByText('Saved · version')).toBeVisible()
  await page.getByTestId('check-fix').click()
  await expect(page.getByTestId('planted-remaining')).toContainText('Braille separation from the raised characters')
  await expect(page.getByTestId('practice-verdict')).not.toContainText(/\d\.\d+ in/)
  await expectNoAxeViolations(page, 'practice view')
  await snap(page, 'lessons-04-practice-before')

  const y = page.getByLabel(/Position from the plate’s top edge/)
  await y.fill('1.95')
  await y.press('Tab')
  await page.getByTestId('check-fix').click()
  await expect(page.getByTestId('practice-solved')).toBeVisible()
  await expect(page.getByTestId('planted-fixed')).toContainText('Braille separation from the raised characters')
  await snap(page, 'lessons-05-practice-solved')

  // Progress shows it.
  await page.goto('/lessons/progress')
  await expect(page.getByRole('heading', { level: 1, name: 'My progress' })).toBeVisible()
  await expect(page.getByTestId('my-practice-braille-gap-practice')).toContainText('Solved')
  await expectNoAxeViolations(page, 'my progress')
  await snap(page, 'lessons-06-my-progress')
})

test('reviewer: sees the trainee’s progress', async ({ page }) => {
  await signIn(page, 'reviewer@tidewater.example')
  await page.goto('/lessons')
  await page.getByTestId('progress-link').click()
  await expect(page.getByRole('heading', { level: 1, name: 'Trainee progress' })).toBeVisible()
  const row = page.getByTestId('progress-row-trainee@tidewater.example')
  await expect(row).toContainText('Toby Trainee')
  await expect(row).toContainText('Exam Room 2')
  await expect(row.getByRole('cell').nth(1)).toContainText(/[1-7] of 7/)
  await expectNoAxeViolations(page, 'trainee progress')
  await snap(page, 'lessons-07-reviewer-progress')
})

for (const id of ['raised-characters', 'pictograms', 'visual-characters', 'installation', 'standards-compared', 'sign-types']) {
  test(`lesson ${id} passes axe and draws its examples`, async ({ page }) => {
    await signIn(page, 'trainee@tidewater.example')
    await page.goto(`/lessons/${id}`)
    await expect(page.getByRole('heading', { level: 2, name: 'Annotated examples' })).toBeVisible()
    await expect(page.locator('[data-testid^="example-"]').first().getByTestId('lesson-canvas')).toBeVisible()
    await expectNoAxeViolations(page, `lesson ${id}`)
    await snap(page, `lessons-10-${id}`)
  })
}

test('the height calculator answers with the table lookup; a rule link lands on its heading', async ({ page }) => {
  await signIn(page, 'trainee@tidewater.example')
  await page.goto('/lessons/visual-characters')
  await page.getByLabel('Viewing distance (ft)').fill('10')
  await page.getByLabel('Baseline above the floor (in)').fill('60')
  await page.getByLabel('Baseline above the floor (in)').press('Tab')
  await expect(page.getByTestId('calculator-result')).toContainText('1.125 in')
  await page.getByTestId('visual-height-calculator').screenshot({ path: '.data/screenshots/lessons-11-calculator.png', animations: 'disabled' })
  await page.goto('/lessons/braille#position-and-clear-space')
  await expect(page.locator('h2#position-and-clear-space')).toBeInViewport()
})

test('designer: each finding in the editor links to the lesson section that explains it', async ({ page }) => {
  test.setTimeout(120_000)
  await signIn(page, 'designer@tidewater.example')
  await page.getByRole('table', { name: 'Projects' }).getByRole('link', { name: 'Harbor Point Community Clinic' }).click()
  await expect(page.getByRole('heading', { level: 2, name: 'Signs' })).toBeVisible()
  await page.getByRole('table', { name: /Signs/ }).getByRole('link').first().click()
  await expect(page.getByTestId('sign-editor')).toBeVisible()
  await expect(page.getByTestId('findings-summary')).toContainText('meet', { timeout: 30_000 })
  const link = page.getByTestId('finding-lesson-link').first()
  await expect(link).toHaveAttribute('target', '_blank')
  const href = (await link.getAttribute('href'))!
  expect(href).toMatch(/^\/lessons\/[a-z-]+#[a-z0-9-]+$/)
  await expect(page.getByTestId('finding-lesson-link')).toHaveCount(await page.getByTestId('finding').count())
  await page.goto(href)
  await expect(page.locator(`h2#${href.split('#')[1]}`)).toBeInViewport()
})

test('lesson Markdown is sanitised in the browser (scripts, handlers and javascript: links removed)', async ({ page }) => {
  await signIn(page, 'trainee@tidewater.example')
  const dialogs: string[] = []
  page.on('dialog', (d) => {
    dialogs.push(d.message())
    void d.dismiss()
  })
  // Serve the real lesson with hostile Markdown appended, as if a content file had been tampered with.
  await page.route('**/api/lessons/braille', async (route) => {
    const res = await route.fetch()
    const json = await res.json()
    json.lesson.body += '\n\n<script>window.__pwned = 1; alert("s")</script>\n\n<img src="data:," onerror="window.__pwned = 2; alert(\'i\')">\n\n[evil](javascript:alert("l"))\n\n<a href="#x" onclick="alert(\'c\')" id="evil-a">a</a>\n'
    await route.fulfill({ response: res, json })
  })
  await page.goto('/lessons/braille')
  await expect(page.getByRole('heading', { level: 1, name: 'Braille' })).toBeVisible()
  await expect(page.locator('h2#position-and-clear-space')).toBeVisible()
  const text = page.locator('.lesson__text')
  await expect(text.locator('script')).toHaveCount(0)
  await expect(text.locator('[onerror], [onclick]')).toHaveCount(0)
  await expect(text.locator('a[href^="javascript:"]')).toHaveCount(0)
  await expect(text.getByText('evil')).toBeVisible()
  expect(await page.evaluate(() => (window as unknown as { __pwned?: number }).__pwned)).toBeUndefined()
  expect(dialogs).toEqual([])
})
