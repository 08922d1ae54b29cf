/** Pure geometry: outlines → polygons, distances with bounds pruning, bounds. */
export * from './types'
export * from './flatten'
export * from './shape'
export * from './distance'
export * from './brailleCells'
export * from './contrast'
export * from './placement'
