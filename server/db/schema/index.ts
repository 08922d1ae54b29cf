// Every table, one per file. Add new tables here, then `npm run db:generate`.
export * from './organisations'
export * from './users'
export * from './sessions'
export * from './user-tokens'
export * from './projects'
export * from './audit-log'
