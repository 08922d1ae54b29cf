declare module 'opentype.js/dist/opentype.mjs' { export function parse(buffer: ArrayBuffer, opt?: Record<string, unknown>): any }
