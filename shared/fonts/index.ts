/** Font loading, profiles and unit-size text layout (isomorphic). */
export * from './registry'
export * from './profile'
export * from './layoutText'
export * from './outline'
