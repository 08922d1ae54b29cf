import { z } from 'zod'
import { LayoutDocumentSchema, LAYOUT_SCHEMA_VERSION } from './layout'

/**
 * JSON Schema (draft 2020-12) of the layout document as a client may send it
 * (fields with defaults are optional). Written to docs/layout.schema.json by
 * `node --import tsx scripts/export-layout-schema.ts`; a test keeps the file current.
 */
export function layoutJsonSchema(): Record<string, unknown> {
  const schema = z.toJSONSchema(LayoutDocumentSchema, { io: 'input', unrepresentable: 'any' }) as Record<string, unknown>
  return {
    ...schema,
    $id: 'https://touchproof.invalid/schemas/layout.schema.json',
    title: `Touchproof layout document, schemaVersion ${LAYOUT_SCHEMA_VERSION}`,
    description:
      "Every length is a number in the document's `units` ('in' or 'mm'); positions are plate coordinates (origin top-left, y down).",
  }
}

/** The file text exactly as committed (2-space JSON + newline). */
export function layoutJsonSchemaText(): string {
  return JSON.stringify(layoutJsonSchema(), null, 2) + '\n'
}
