import { and, eq } from 'drizzle-orm'
import type { LayoutDocument, Units } from '../../shared/schema/layout'
import type { ScheduleRow } from '../../shared/schedule/index'
import type { Queryable } from '../db/client'
import { signs } from '../db/schema/index'
import { buildSignLayout } from '../signs/templates'

/**
 * The layout for one schedule row: the sign type's template with the row's words, then the
 * row's door (single: the sign on the latch side, opposite the hinges; double: to the right of
 * the right-hand leaf, §703.4.2) and mounting height.
 */
export async function layoutForRow(row: ScheduleRow, units: Units): Promise<LayoutDocument> {
  const doc = await buildSignLayout({ signType: row.signType, text: row.text, units, name: row.name })
  const inst = doc.installation
  if (inst.door && row.door) {
    const hinge = row.hingeSide ?? inst.door.hingeSide
    inst.door = { ...inst.door, leaves: row.door, hingeSide: hinge }
    if (inst.location?.mount === 'wall') inst.location = { ...inst.location, side: row.door === 'double' ? 'right' : hinge === 'left' ? 'right' : 'left' }
  }
  if (row.mountingHeight !== null) inst.mountingHeight = row.mountingHeight
  return doc
}

/** Names of the project's signs (schedule rows must not repeat them). */
export async function existingSignNames(q: Queryable, organisationId: string, projectId: string): Promise<Set<string>> {
  const rows = await q.select({ name: signs.name }).from(signs).where(and(eq(signs.organisationId, organisationId), eq(signs.projectId, projectId)))
  return new Set(rows.map((r) => r.name))
}
