/** Writes docs/layout.schema.json from the zod schema (run after changing shared/schema/layout.ts). */
import { writeFileSync, mkdirSync } from 'node:fs'
import { fileURLToPath } from 'node:url'
import { dirname, join } from 'node:path'
import { layoutJsonSchemaText } from '../shared/schema/layoutJsonSchema'

const root = join(dirname(fileURLToPath(import.meta.url)), '..')
mkdirSync(join(root, 'docs'), { recursive: true })
writeFileSync(join(root, 'docs/layout.schema.json'), layoutJsonSchemaText())
console.log('wrote docs/layout.schema.json')
