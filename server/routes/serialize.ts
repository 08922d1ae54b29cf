import type { Project } from '../../shared/schema/api/projects'
import type { User } from '../../shared/schema/api/users'
import type { ProjectRow, UserRow } from '../db/schema/index'

/** Row -> API shape for projects (dates as ISO strings). */
export const projectJson = (p: ProjectRow): Project => ({
  id: p.id,
  name: p.name,
  address: p.address,
  standardId: p.standardId,
  unitSystem: p.unitSystem,
  version: p.version,
  createdAt: p.createdAt.toISOString(),
  updatedAt: p.updatedAt.toISOString(),
})

/** Row -> API shape for users: never includes the password hash. */
export const userJson = (u: UserRow): User => ({
  id: u.id,
  email: u.email,
  displayName: u.displayName,
  role: u.role,
  status: u.status,
  createdAt: u.createdAt.toISOString(),
})
