import { memoTranslate } from '../../shared/rules/memoTranslate'
import { checkLayout } from '../../shared/rules/engine'
import type { CheckReport } from '../../shared/rules/types'
import type { LayoutDocument } from '../../shared/schema/layout'
import type { StandardId } from '../../shared/standards/types'
import type { SignCheckSummary } from '../../shared/schema/api/signs'
import { eq } from 'drizzle-orm'
import type { Queryable } from '../db/client'
import { projects } from '../db/schema/index'
import { resolveDocumentFonts } from '../fonts/resolver'
import { getTranslator } from './translator'

/**
 * The server's run of the engine on one document: the organisation's fonts (built-in and
 * uploaded) and the Node braille translator. This run is the one stored and signed off.
 */
export async function checkDocument(q: Queryable, organisationId: string, doc: LayoutDocument, standard: StandardId): Promise<CheckReport> {
  const [fonts, translate] = await Promise.all([resolveDocumentFonts(q, organisationId, doc), getTranslator()])
  return checkLayout(doc, { fonts, translate: memoTranslate(translate), standard })
}

/** The counts a sign keeps from its last check. */
export function checkSummary(report: CheckReport, revision: number, at = new Date()): SignCheckSummary {
  return {
    standard: report.standard,
    engineVersion: report.engineVersion,
    revision,
    fails: report.summary.fails,
    advisory: report.summary.advisory,
    meets: report.summary.meets,
    notApplicable: report.summary.notApplicable,
    checkedAt: at.toISOString(),
  }
}

/**
 * Counts for a document about to be saved, so the project's sign table is current without a
 * batch check. A failure to check never blocks the save: the counts are then left empty.
 */
export async function summaryForSave(q: Queryable, organisationId: string, doc: LayoutDocument, standard: StandardId, revision: number): Promise<SignCheckSummary | null> {
  try {
    return checkSummary(await checkDocument(q, organisationId, doc, standard), revision)
  } catch {
    return null
  }
}

/** The standard a project's signs are checked against. */
export async function projectStandard(q: Queryable, projectId: string): Promise<StandardId> {
  const [p] = await q.select({ standardId: projects.standardId }).from(projects).where(eq(projects.id, projectId)).limit(1)
  return p?.standardId ?? 'ada-2010'
}
