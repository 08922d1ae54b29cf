import { expect, test } from '@playwright/test'
import { signIn, waitForMail, waitForMails } from './support'

test('admin invites by e-mail; the invitee follows the mailed link, sets a password and signs in', async ({ page }) => {
  const email = `invitee-${Date.now()}@tidewater.example`
  await signIn(page, 'admin@tidewater.example')
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Users' }).click()
  await expect(page.getByRole('heading', { level: 1, name: 'Users' })).toBeVisible()
  await page.getByRole('button', { name: 'Invite user' }).click()
  const dialog = page.getByRole('dialog', { name: 'Invite a user' })
  await expect(dialog.getByLabel('E-mail')).toBeFocused()
  await dialog.getByLabel('E-mail').fill(email)
  await dialog.getByLabel('Name').fill('Morgan Newcomer')
  await dialog.getByRole('combobox', { name: 'Role' }).click()
  await page.getByRole('option', { name: 'Reviewer' }).click()
  await dialog.getByRole('button', { name: 'Send invitation' }).click()
  await expect(page.getByText('Invitation sent')).toBeVisible()
  const row = page.getByRole('table', { name: 'Users' }).getByRole('row').filter({ hasText: email })
  await expect(row).toContainText('Invited')
  await page.getByRole('button', { name: 'Sign out' }).click()
  await expect(page.getByRole('heading', { level: 1, name: 'Sign in' })).toBeVisible()

  // The mail arrives in the fake inbox with a one-time link.
  const mail = await waitForMail(email)
  expect(mail.subject).toBe('You are invited to Tidewater Tactile Signs on Touchproof')
  const link = /(http:\/\/\S+\/accept-invitation\?token=[A-Za-z0-9_-]+)/.exec(mail.text)?.[1]
  expect(link, mail.text).toBeTruthy()

  await page.goto(link!)
  await expect(page.getByRole('heading', { level: 1, name: 'Accept your invitation' })).toBeVisible()
  await expect(page.getByText('Welcome, Morgan Newcomer')).toBeVisible()
  await page.getByLabel('New password').fill('harbour lights at dusk')
  await page.getByLabel('Repeat the password').fill('harbour lights at dusk')
  await page.getByRole('button', { name: 'Set password and continue' }).click()

  await expect(page.getByRole('heading', { level: 1, name: 'Sign in' })).toBeVisible()
  await expect(page.getByText('Password set.')).toBeVisible()
  await expect(page.getByLabel('E-mail')).toHaveValue(email)
  await page.getByLabel('Password', { exact: true }).fill('harbour lights at dusk')
  await page.getByRole('button', { name: 'Sign in' }).click()
  await expect(page.getByRole('heading', { level: 1, name: 'Projects' })).toBeVisible()
  await expect(page.getByRole('banner')).toContainText('Morgan Newcomer')
  await expect(page.getByRole('banner')).toContainText('Reviewer')
  // Reviewers read projects but do not create them.
  await expect(page.getByRole('button', { name: 'New project' })).toHaveCount(0)

  // The link works once.
  await page.getByRole('button', { name: 'Sign out' }).click()
  await page.goto(link!)
  await expect(page.getByRole('alert')).toContainText('expired or was already used')
})

test('admin resends an invitation: a second mail arrives and only its link works', async ({ page }) => {
  const email = `resend-${Date.now()}@tidewater.example`
  await signIn(page, 'admin@tidewater.example')
  const origin = new URL(page.url()).origin
  const res = await page.request.post('/api/users', { data: { email, displayName: 'Robin Resend', role: 'designer' }, headers: { Origin: origin } })
  expect(res.status()).toBe(201)
  await page.goto('/admin/users')
  await page.getByRole('button', { name: 'Resend invitation to Robin Resend' }).click()
  await expect(page.getByText('Invitation sent again')).toBeVisible()
  const [first, second] = await waitForMails(email, 2)
  const tokenOf = (text: string) => /accept-invitation\?token=([A-Za-z0-9_-]+)/.exec(text)![1]!
  expect(tokenOf(second!.text)).not.toBe(tokenOf(first!.text))
  await page.getByRole('button', { name: 'Sign out' }).click()
  await page.goto(`/accept-invitation?token=${tokenOf(first!.text)}`)
  await expect(page.getByRole('alert')).toContainText('expired or was already used')
  await page.goto(`/accept-invitation?token=${tokenOf(second!.text)}`)
  await expect(page.getByText('Welcome, Robin Resend')).toBeVisible()
})
