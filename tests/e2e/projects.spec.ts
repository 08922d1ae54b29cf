import { expect, test } from '@playwright/test'
import { signIn } from './support'

test('designer signs in, creates, renames and deletes a project, then signs out', async ({ page }) => {
  await signIn(page, 'designer@tidewater.example')
  const table = page.getByRole('table', { name: 'Projects' })
  await expect(table.getByRole('link', { name: 'Harbor Point Community Clinic' })).toBeVisible()
  await expect(page.getByRole('banner')).toContainText('Dana Designer')
  await expect(page.getByRole('contentinfo', { name: 'Caution' })).toContainText('authority having jurisdiction')

  const name = `Quayside Library ${Date.now()}`
  await page.getByRole('button', { name: 'New project' }).click()
  const dialog = page.getByRole('dialog', { name: 'New project' })
  // The dialog moves focus to its first field once open; type only after that.
  await expect(dialog.getByLabel('Project name')).toBeFocused()
  await dialog.getByLabel('Project name').fill(name)
  await dialog.getByLabel('Address').fill('9 Ferry Lane (invented)')
  await dialog.getByRole('combobox', { name: 'Units' }).click()
  await page.getByRole('option', { name: 'Millimetres' }).click()
  await dialog.getByRole('button', { name: 'Create project' }).click()
  await expect(dialog).toBeHidden()
  const row = table.getByRole('row').filter({ hasText: name })
  await expect(row).toContainText('Millimetres')
  await expect(row).toContainText('2010 ADA Standards')

  // Filter narrows the table to matching rows.
  await page.getByLabel('Filter').fill('quayside')
  await expect(table.getByRole('link', { name: 'Harbor Point Community Clinic' })).toBeHidden()
  await expect(row).toBeVisible()
  await page.getByLabel('Filter').fill('')

  const renamed = `${name} (East)`
  await row.getByRole('button', { name: `Rename ${name}` }).click()
  const rename = page.getByRole('dialog', { name: 'Rename project' })
  await expect(rename.getByLabel('Project name')).toBeFocused()
  await expect(rename.getByLabel('Project name')).toHaveValue(name)
  await rename.getByLabel('Project name').fill(renamed)
  await rename.getByRole('button', { name: 'Save name' }).click()
  await expect(table.getByRole('link', { name: renamed })).toBeVisible()

  // The rename reached the server: the project page shows it at version 2.
  await table.getByRole('link', { name: renamed }).click()
  await expect(page.getByRole('heading', { level: 1, name: renamed })).toBeVisible()
  await expect(page.getByText('version 2')).toBeVisible()
  await page.getByRole('navigation', { name: 'Breadcrumb' }).getByRole('link', { name: 'Projects' }).click()

  await table.getByRole('row').filter({ hasText: renamed }).getByRole('button', { name: `Delete ${renamed}` }).click()
  const confirm = page.getByRole('alertdialog', { name: 'Delete project?' })
  await expect(confirm).toContainText(renamed)
  await confirm.getByRole('button', { name: 'Delete project' }).click()
  await expect(table.getByRole('link', { name: renamed })).toBeHidden()
  await page.reload()
  await expect(table.getByRole('link', { name: 'Harbor Point Community Clinic' })).toBeVisible()
  await expect(table.getByRole('link', { name: renamed })).toHaveCount(0)

  await page.getByRole('button', { name: 'Sign out' }).click()
  await expect(page.getByRole('heading', { level: 1, name: 'Sign in' })).toBeVisible()
  await page.goto('/projects')
  await expect(page).toHaveURL(/\/sign-in/)
})

test('a wrong password shows an error and keeps the visitor signed out', async ({ page }) => {
  await page.goto('/sign-in')
  await page.getByLabel('E-mail').fill('designer@tidewater.example')
  await page.getByLabel('Password', { exact: true }).fill('not-the-password')
  await page.getByRole('button', { name: 'Sign in' }).click()
  await expect(page.getByRole('alert')).toContainText('E-mail or password is wrong')
  await expect(page).toHaveURL(/\/sign-in/)
})

test('a designer cannot open the users admin page', async ({ page }) => {
  await signIn(page, 'designer2@tidewater.example')
  await expect(page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Users' })).toHaveCount(0)
  await page.goto('/admin/users')
  await expect(page.getByRole('heading', { level: 1, name: 'Not allowed for your role' })).toBeVisible()
})
