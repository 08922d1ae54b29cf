/** Lessons: content schema and parsing, callouts, practice judging, quiz answers, rule links (isomorphic). */
export * from './schema'
export * from './parse'
export * from './select'
export * from './callouts'
export * from './practice'
export * from './quiz'
export * from './ruleLinks'
