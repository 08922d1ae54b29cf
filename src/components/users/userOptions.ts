import type { Role } from '../../../shared/schema/api/common'
import type { UserStatus } from '../../../shared/schema/api/users'

export const roleOptions: Array<{ value: Role; label: string }> = [
  { value: 'admin', label: 'Admin' },
  { value: 'designer', label: 'Designer' },
  { value: 'reviewer', label: 'Reviewer' },
  { value: 'trainee', label: 'Trainee' },
]

/** Status always as icon + word, never colour alone. */
export const statusDisplay: Record<UserStatus, { label: string; icon: string }> = {
  active: { label: 'Active', icon: 'pi pi-check-circle' },
  invited: { label: 'Invited', icon: 'pi pi-envelope' },
  disabled: { label: 'Disabled', icon: 'pi pi-ban' },
}
