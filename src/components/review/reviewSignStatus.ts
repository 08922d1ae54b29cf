import { SIGN_STATUS_LABELS, type SignStatus } from '../../../shared/schema/api/signs'

/** A sign's status as icon + word (never colour alone) with a class for the tint. */
export const SIGN_STATUS_UI: Record<SignStatus, { word: string; icon: string; cls: string }> = {
  draft: { word: SIGN_STATUS_LABELS.draft, icon: 'pi pi-file-edit', cls: 'review-status--draft' },
  'in-review': { word: SIGN_STATUS_LABELS['in-review'], icon: 'pi pi-eye', cls: 'review-status--in-review' },
  returned: { word: SIGN_STATUS_LABELS.returned, icon: 'pi pi-replay', cls: 'review-status--returned' },
  'signed-off': { word: SIGN_STATUS_LABELS['signed-off'], icon: 'pi pi-verified', cls: 'review-status--signed-off' },
  superseded: { word: SIGN_STATUS_LABELS.superseded, icon: 'pi pi-history', cls: 'review-status--superseded' },
}

/** Statuses a designer may submit for review from (matches the server's rule). */
export const SUBMITTABLE_STATUSES: ReadonlySet<SignStatus> = new Set(['draft', 'returned', 'superseded'])
