/**
 * Regenerates examples/*.json (the Harbor Point demo layouts) with the real
 * translator, aligning braille to the measured ink of the text. Run after a
 * schema change, then `npx vitest run tests/unit/engine/examples.test.ts`.
 */
import { writeFileSync, mkdirSync } from 'node:fs'
import { createNodeTranslator } from '../server/braille/nodeTranslator'
import { nodeFontRegistry } from '../server/engine/nodeFonts'
import { measureText } from '../shared/rules/measure'
import { createBraille, createEmptyLayout, createRaisedText, type LayoutDocument, type Braille, type RaisedText } from '../shared/schema/layout'
const tr = await createNodeTranslator()
const fonts = nodeFontRegistry()
const out: Record<string, LayoutDocument> = {}

function sign(name: string, o: { lines: string[]; w: number; h: number; cap?: number; tracking?: number; top?: number; x?: number; font?: string; gap?: number; mount: number; align?: 'left'|'center' }): { d: LayoutDocument; t: RaisedText; b: Braille } {
  const d = createEmptyLayout('in', name)
  d.plate.width = o.w; d.plate.height = o.h; d.plate.colour = '#1f3a5f'; d.plate.material.raisedThickness = 0.0325
  const t = createRaisedText('in', 't1', o.lines, { x: o.x ?? 0.75, y: o.top ?? 0.75 })
  t.capHeight = o.cap ?? 0.75; t.tracking = o.tracking ?? 0.08; t.lineSpacing = t.capHeight * 1.5; t.fontId = o.font ?? 'b612'
  if (o.align === 'center') { t.align = 'center'; t.position.x = o.w / 2 }
  const tm = measureText(t, fonts.get(t.fontId)!)
  const r = tr(o.lines.join(' '), { code: 'ueb' })
  const b = createBraille('in', 'b1', 't1', { x: tm.ink.minX, y: tm.ink.maxY + (o.gap ?? 0.45) })
  if (o.align === 'center') { b.align = 'center'; b.position.x = (tm.ink.minX + tm.ink.maxX) / 2 }
  b.generated = { prepared: r.prepared, unicode: r.unicode }
  d.elements.push(t, b)
  d.installation.mountingHeight = o.mount
  d.installation.viewingDistance = 36
  return { d, t, b }
}
const door = (d: LayoutDocument, patch: Partial<NonNullable<LayoutDocument['installation']['door']>> = {}, offset = 7, side: 'left'|'right' = 'right') => {
  d.installation.door = { leaves: 'single', leafWidth: 36, hingeSide: 'left', swing: 'toward-sign-side', activeLeaves: 'both', closer: true, holdOpen: false, latchSideWallAvailable: true, ...patch }
  d.installation.location = { mount: 'wall', side, offsetFromDoor: offset }
}

{ const { d } = sign('Exam Room 101 — Harbor Point Community Clinic, level 1', { lines: ['EXAM ROOM', '101'], w: 8, h: 4.5, mount: 47 }); door(d); out['exam-room-101'] = d }
{ const { d } = sign('Exam Room 102 — characters set without tracking', { lines: ['EXAM ROOM', '102'], w: 8, h: 4.5, mount: 47, tracking: 0 }); door(d); out['exam-room-102-tight-spacing'] = d }
{
  const { d, t, b } = sign('Family Restroom — pictogram field with descriptor', { lines: ['FAMILY', 'RESTROOM'], w: 8, h: 10.5, top: 7, mount: 47.2, align: 'center' })
  d.installation.signType = 'restroom'
  d.elements.push({ kind: 'pictogram-field', id: 'pf', box: { x: 1, y: 0.5, width: 6, height: 6 }, pictogram: { source: 'builtin', id: 'restroom-family' }, descriptorId: 't1', raised: false, colour: '#ffffff' })
  door(d); void t; void b; out['family-restroom'] = d
}
{
  const { d, b } = sign('Family Restroom (upstairs) — small field, braille crowding the text', { lines: ['FAMILY', 'RESTROOM'], w: 8, h: 9.5, top: 6, mount: 47.5, align: 'center', gap: 0.25 })
  d.installation.signType = 'restroom'
  d.elements.push({ kind: 'pictogram-field', id: 'pf', box: { x: 1.5, y: 0.5, width: 5, height: 5 }, pictogram: { source: 'builtin', id: 'restroom-family' }, descriptorId: 't1', raised: false, colour: '#ffffff' })
  door(d); void b; out['family-restroom-small-field'] = d
}
{ const { d } = sign('Stair 2 exit door — door swings into the stair', { lines: ['EXIT'], w: 5, h: 3.5, mount: 47.5 }); d.installation.signType = 'exit'; door(d, { swing: 'away-from-sign-side' }, 4); out['stair-2-exit'] = d }
{
  const { d } = sign('Elevator hoistway jamb, level 2', { lines: ['2'], w: 4, h: 4, cap: 2, top: 0.5, mount: 47.5, align: 'center' })
  d.installation.signType = 'hoistway-jamb'; d.plate.colour = '#000000'
  out['elevator-hoistway-jamb-2'] = d
}
{ const { d } = sign('Records Room — bold face', { lines: ['RECORDS'], w: 8, h: 3.5, mount: 47.5, font: 'b612-bold' }); door(d); out['records-room-bold'] = d }
{
  const { d, b } = sign('Records Room (annex) — text edited after translation, mounted high', { lines: ['RECORDS', 'ANNEX'], w: 8, h: 4.5, mount: 58 })
  const old = tr('RECORDS', { code: 'ueb' }); b.generated = { prepared: old.prepared, unicode: old.unicode }
  door(d); out['records-annex-stale-braille'] = d
}
{
  const d = createEmptyLayout('in', 'Directional — exam rooms, read across the waiting room')
  d.plate.width = 14; d.plate.height = 5.5; d.plate.colour = '#1f3a5f'
  d.installation.signType = 'directional'; d.installation.mountingHeight = 62; d.installation.viewingDistance = 120
  d.elements.push({ kind: 'visual-text', id: 'v1', lines: ['EXAM ROOMS', '101 TO 108'], fontId: 'b612', capHeight: 1.25, tracking: 0.04, lineSpacing: 1.9, align: 'left', position: { x: 0.75, y: 1 }, colour: '#ffffff' })
  out['directional-exam-rooms'] = d
}
{
  const d = createEmptyLayout('in', 'Directional — records, seen from the far end of the corridor')
  d.plate.width = 12; d.plate.height = 3; d.plate.colour = '#1f3a5f'
  d.installation.signType = 'directional'; d.installation.mountingHeight = 64; d.installation.viewingDistance = 240
  d.elements.push({ kind: 'visual-text', id: 'v1', lines: ['RECORDS'], fontId: 'b612', capHeight: 1, tracking: 0.08, lineSpacing: 1.5, align: 'left', position: { x: 0.75, y: 1 }, colour: '#ffffff' })
  out['directional-records-too-small'] = d
}
{ const { d } = sign('Waiting Room — sign on the hinge side, in the door swing', { lines: ['WAITING', 'ROOM'], w: 8, h: 4.5, mount: 47 }); door(d, {}, 2, 'left'); out['waiting-room-hinge-side'] = d }
{
  const { d, b } = sign('Lab — braille made with paper-book dots', { lines: ['LAB'], w: 6, h: 3.5, mount: 47.5 })
  b.dots = { diameter: 0.057, spacing: 0.092, cellPitch: 0.245, linePitch: 0.4, height: 0.019 }
  door(d, {}, 9); out['lab-paper-braille'] = d
}
{
  const { d, b } = sign('Office 104 — ADA-range braille, 0.6 in below the text', { lines: ['OFFICE', '104'], w: 8, h: 4.5, mount: 47, gap: 0.6 })
  b.dots = { diameter: 0.06, spacing: 0.09, cellPitch: 0.25, linePitch: 0.4, height: 0.03 }
  door(d); out['office-104-ada-braille'] = d
}
{
  // Metric: 19 mm characters, 2.5/7.6 mm braille.
  const d = createEmptyLayout('mm', 'Exam Room 103 — metric document')
  d.plate.width = 200; d.plate.height = 115; d.plate.colour = '#1f3a5f'; d.plate.material.raisedThickness = 0.85
  const t = createRaisedText('mm', 't1', ['EXAM ROOM', '103'], { x: 19, y: 19 }); t.tracking = 2; t.lineSpacing = 28.5
  const tm = measureText(t, fonts.get('b612')!)
  const r = tr('EXAM ROOM 103', { code: 'ueb' })
  const b = createBraille('mm', 'b1', 't1', { x: tm.ink.minX, y: tm.ink.maxY + 11 }); b.generated = { prepared: r.prepared, unicode: r.unicode }
  d.elements.push(t, b)
  d.installation.mountingHeight = 1195; d.installation.viewingDistance = 900
  d.installation.door = { leaves: 'single', leafWidth: 915, hingeSide: 'left', swing: 'toward-sign-side', activeLeaves: 'both', closer: true, holdOpen: false, latchSideWallAvailable: true }
  d.installation.location = { mount: 'wall', side: 'right', offsetFromDoor: 180 }
  out['exam-room-103-metric'] = d
}
mkdirSync('examples', { recursive: true })
const round = (k: string, v: unknown) => (typeof v === 'number' ? Math.round(v * 1e6) / 1e6 : v)
for (const [k, d] of Object.entries(out)) writeFileSync(`examples/${k}.json`, JSON.stringify(d, round, 2) + '\n')
console.log(Object.keys(out).length)
