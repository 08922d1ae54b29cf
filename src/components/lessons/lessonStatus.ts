import type { Status } from '../../../shared/rules/types'

/** Status as icon + word (never colour alone); `not-checked` = the standard has no such rule here. */
export const LESSON_STATUS_UI: Record<Status | 'not-checked', { word: string; icon: string; cls: string }> = {
  fails: { word: 'Fails', icon: 'pi pi-times-circle', cls: 'lesson-status--fails' },
  advisory: { word: 'Advisory', icon: 'pi pi-exclamation-circle', cls: 'lesson-status--advisory' },
  meets: { word: 'Meets', icon: 'pi pi-check-circle', cls: 'lesson-status--meets' },
  'not-applicable': { word: 'Not applicable', icon: 'pi pi-minus-circle', cls: 'lesson-status--na' },
  'not-checked': { word: 'No such rule', icon: 'pi pi-minus-circle', cls: 'lesson-status--na' },
}

/** Canvas colours per status (the label beside the leader always carries the word too). */
export const CALLOUT_COLOURS: Record<Status | 'not-checked', string> = {
  fails: '#b0421a',
  advisory: '#8a6d00',
  meets: '#2f6b3a',
  'not-applicable': '#5d6980',
  'not-checked': '#5d6980',
}
