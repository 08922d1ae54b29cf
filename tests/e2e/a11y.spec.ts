import { expect, test, type Page } from '@playwright/test'
import { expectNoAxeViolations, signIn, snap, waitForMail } from './support'

/** Every view passes axe-core with zero violations; a screenshot of each lands in .data/screenshots. */

async function check(page: Page, name: string) {
  await expectNoAxeViolations(page, name)
  await snap(page, name)
}

test.describe('views signed out', () => {
  test('sign in', async ({ page }) => {
    await page.goto('/sign-in')
    await expect(page.getByRole('heading', { level: 1, name: 'Sign in' })).toBeVisible()
    await check(page, '01-sign-in')
  })

  test('sign in with an error', async ({ page }) => {
    await page.goto('/sign-in')
    await page.getByRole('button', { name: 'Sign in' }).click()
    await expect(page.getByRole('alert')).toBeVisible()
    await check(page, '02-sign-in-error')
  })

  test('forgot password, request sent', async ({ page }) => {
    await page.goto('/forgot-password')
    await expect(page.getByRole('heading', { level: 1, name: 'Reset your password' })).toBeVisible()
    await check(page, '03-forgot-password')
    await page.getByLabel('E-mail').fill('trainee@tidewater.example')
    await page.getByRole('button', { name: 'Send reset link' }).click()
    await expect(page.getByRole('status')).toContainText('reset link is on its way')
    await check(page, '04-forgot-password-sent')

    const mail = await waitForMail('trainee@tidewater.example')
    const link = /(http:\/\/\S+\/reset-password\?token=[A-Za-z0-9_-]+)/.exec(mail.text)?.[1]
    expect(link).toBeTruthy()
    await page.goto(link!)
    await expect(page.getByRole('heading', { level: 1, name: 'Choose a new password' })).toBeVisible()
    await expect(page.getByText('trainee@tidewater.example')).toBeVisible()
    await check(page, '05-reset-password')
  })

  test('invitation link that is not valid', async ({ page }) => {
    await page.goto('/accept-invitation?token=' + 'x'.repeat(43))
    await expect(page.getByRole('alert')).toContainText('expired or was already used')
    await check(page, '06-accept-invitation-invalid')
  })

  test('404', async ({ page }) => {
    await page.goto('/no/such/page')
    await expect(page.getByRole('heading', { level: 1, name: 'Page not found' })).toBeVisible()
    await check(page, '07-not-found')
  })
})

test.describe('views signed in', () => {
  test('projects list and the new-project dialog', async ({ page }) => {
    await signIn(page, 'designer@tidewater.example')
    await expect(page.getByRole('link', { name: 'Harbor Point Community Clinic' })).toBeVisible()
    await check(page, '10-projects')
    await page.getByRole('button', { name: 'New project' }).click()
    await expect(page.getByRole('dialog', { name: 'New project' })).toBeVisible()
    await check(page, '11-projects-new-dialog')
  })

  test('delete confirmation', async ({ page }) => {
    await signIn(page, 'designer@tidewater.example')
    await page.getByRole('button', { name: 'Delete Harbor Point Community Clinic' }).click()
    await expect(page.getByRole('alertdialog', { name: 'Delete project?' })).toBeVisible()
    await check(page, '12-projects-delete-confirm')
    await page.getByRole('button', { name: 'Keep it' }).click()
    await expect(page.getByRole('link', { name: 'Harbor Point Community Clinic' })).toBeVisible()
  })

  test('project page, editable and read-only', async ({ page }) => {
    await signIn(page, 'designer@tidewater.example')
    await page.getByRole('link', { name: 'Harbor Point Community Clinic' }).click()
    await expect(page.getByRole('heading', { level: 1, name: 'Harbor Point Community Clinic' })).toBeVisible()
    await expect(page.getByLabel('Project name')).toHaveValue('Harbor Point Community Clinic')
    await check(page, '13-project')
    await page.getByRole('button', { name: 'Sign out' }).click()
    await signIn(page, 'reviewer@tidewater.example')
    await page.getByRole('link', { name: 'Harbor Point Community Clinic' }).click()
    await expect(page.getByText('Read only for your role')).toBeVisible()
    await check(page, '14-project-read-only')
  })

  test('project that does not exist', async ({ page }) => {
    await signIn(page, 'designer@tidewater.example')
    await page.goto('/projects/aaaaaaaaaaaaaaaaaaaa')
    await expect(page.getByRole('heading', { level: 1, name: 'Project not found' })).toBeVisible()
    await check(page, '15-project-not-found')
  })

  test('users admin and the invite dialog', async ({ page }) => {
    await signIn(page, 'admin@tidewater.example')
    await page.goto('/admin/users')
    await expect(page.getByRole('table', { name: 'Users' }).getByText('Dana Designer')).toBeVisible()
    await check(page, '16-users')
    await page.getByRole('button', { name: 'Invite user' }).click()
    await expect(page.getByRole('dialog', { name: 'Invite a user' })).toBeVisible()
    await check(page, '17-users-invite-dialog')
  })

  test('not allowed for the role', async ({ page }) => {
    await signIn(page, 'trainee@tidewater.example')
    await page.goto('/admin/users')
    await expect(page.getByRole('heading', { level: 1, name: 'Not allowed for your role' })).toBeVisible()
    await check(page, '18-forbidden')
  })

  test('accept invitation (valid link)', async ({ page }) => {
    await signIn(page, 'admin@tidewater.example')
    const email = `a11y-${Date.now()}@tidewater.example`
    const res = await page.request.post('/api/users', { data: { email, displayName: 'Sam Sample', role: 'trainee' }, headers: { Origin: new URL(page.url()).origin } })
    expect(res.status()).toBe(201)
    await page.getByRole('button', { name: 'Sign out' }).click()
    const mail = await waitForMail(email)
    const link = /(http:\/\/\S+\/accept-invitation\?token=[A-Za-z0-9_-]+)/.exec(mail.text)![1]!
    await page.goto(link)
    await expect(page.getByText('Welcome, Sam Sample')).toBeVisible()
    await check(page, '08-accept-invitation')
  })
})
