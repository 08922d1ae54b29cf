import { z } from 'zod'

/** `?revision=n` picks an earlier revision of the sign; without it the report is of the current one. */
export const signReportQuerySchema = z.object({ revision: z.coerce.number().int().min(1).max(1_000_000).optional() }).strict()
export type SignReportQuery = z.infer<typeof signReportQuerySchema>

/** Where the PDF reports are served (GET, same-origin session cookie). */
export const REPORT_URLS = {
  sign: (signId: string, revision?: number) => `/api/signs/${signId}/report.pdf${revision ? `?revision=${revision}` : ''}`,
  project: (projectId: string) => `/api/projects/${projectId}/report.pdf`,
}
