import { describe, it } from 'vitest'
import { measureText } from '../../../shared/rules/measure'
import type { LayoutDocument } from '../../../shared/schema/layout'
import { el, fonts, runCase, type RuleCase } from './support'

// Base sign: plate 6 in high, lowest (only) raised baseline 1.5 in below the plate top,
// i.e. 4.5 in above the plate bottom; braille cell bottom 2.21 in from the top (3.79 in above the bottom).
const mount = (m: number) => (d: LayoutDocument) => { d.installation.mountingHeight = m }

const heights: RuleCase[] = [
  { name: 'lowest baseline exactly 48 in meets', section: '703.4.1', source: 'S2', rule: 'mount.tactile-height', requirement: 'mount.tactile-min', doc: mount(43.5), status: 'meets', measured: 48, tol: 1e-9 },
  { name: 'lowest baseline 47.99 in fails', section: '703.4.1', source: 'S2', rule: 'mount.tactile-height', requirement: 'mount.tactile-min', doc: mount(43.49), status: 'fails', measured: 47.99, tol: 1e-9 },
  { name: 'highest baseline exactly 60 in meets', section: '703.4.1', source: 'S2', rule: 'mount.tactile-height', requirement: 'mount.tactile-max', doc: mount(55.5), status: 'meets', measured: 60, tol: 1e-9 },
  { name: 'highest baseline 60.01 in fails', section: '703.4.1', source: 'S2', rule: 'mount.tactile-height', requirement: 'mount.tactile-max', doc: mount(55.51), status: 'fails', measured: 60.01, tol: 1e-9 },
  { name: 'metric: lowest baseline 1220 mm meets', section: '703.4.1', source: 'S2', units: 'mm', rule: 'mount.tactile-height', requirement: 'mount.tactile-min', doc: (d) => { d.installation.mountingHeight = 1220 - 4.5 * 25.4 }, status: 'meets', measured: 1220, tol: 1e-6 },
  { name: 'metric: highest baseline 1525 mm meets (printed value, not 60 × 25.4 = 1524)', section: '703.4.1', source: 'S2', units: 'mm', rule: 'mount.tactile-height', requirement: 'mount.tactile-max', doc: (d) => { d.installation.mountingHeight = 1525 - 4.5 * 25.4 }, status: 'meets', measured: 1525, tol: 1e-6 },
  { name: 'ADA: braille baseline 47.79 in with text at 48.5 in is only advisory', section: '703.4.1', source: 'S2', rule: 'mount.tactile-height', requirement: 'mount.braille-min', doc: mount(44), status: 'advisory', measured: 47.79, tol: 1e-9 },
  { name: 'A117.1 (unverified): braille baseline 47.79 in fails', section: '703.4.1', source: 'M', standard: 'a117-2017', rule: 'mount.tactile-height', requirement: 'mount.braille-min', doc: mount(44), status: 'fails', measured: 47.79, tol: 1e-9 },
  { name: 'CBC (unverified): braille baseline 47.79 in fails', section: '11B-703.4.1', source: 'M', standard: 'cbc-11b-2022', rule: 'mount.tactile-height', requirement: 'mount.braille-min', doc: mount(44), status: 'fails', measured: 47.79, tol: 1e-9 },
  { name: 'CBC: braille baseline 48 in meets', section: '11B-703.4.1', source: 'M', standard: 'cbc-11b-2022', rule: 'mount.tactile-height', requirement: 'mount.braille-min', doc: mount(44.21), status: 'meets', measured: 48, tol: 1e-9 },
  { name: 'elevator car controls are excepted from 703.4.1', section: '703.4.1', source: 'S2', rule: 'mount.tactile-height', doc: (d) => { mount(30)(d); d.installation.signType = 'elevator-car-control' }, status: 'not-applicable' },
  {
    name: 'M1: lowest 48.0 in, highest 59.5 in meets (lowest)', section: '703.4.1', source: 'D (worked example M1)', rule: 'mount.tactile-height', requirement: 'mount.tactile-min',
    doc: (d) => { d.plate.height = 14; const t = el(d, 't1', 'raised-text'); t.lines = ['EXAM', 'ROOM']; t.lineSpacing = 11.5; el(d, 'b1', 'braille').position.y = 13; d.installation.mountingHeight = 48 - (14 - 1.5 - 11.5) },
    status: 'meets', measured: 48, tol: 1e-9,
  },
  {
    name: 'M1: highest 59.5 in meets', section: '703.4.1', source: 'D (worked example M1)', rule: 'mount.tactile-height', requirement: 'mount.tactile-max',
    doc: (d) => { d.plate.height = 14; const t = el(d, 't1', 'raised-text'); t.lines = ['EXAM', 'ROOM']; t.lineSpacing = 11.5; el(d, 'b1', 'braille').position.y = 13; d.installation.mountingHeight = 48 - (14 - 1.5 - 11.5) },
    status: 'meets', measured: 59.5, tol: 1e-9,
  },
]

type DoorPatch = Partial<NonNullable<LayoutDocument['installation']['door']>>
const door = (patch: DoorPatch, location?: LayoutDocument['installation']['location']) => (d: LayoutDocument) => {
  Object.assign(d.installation.door!, patch)
  if (location !== undefined) d.installation.location = location
}

const location: RuleCase[] = [
  { name: 'hinge left, sign right (latch side) meets', section: '703.4.2', source: 'S3', rule: 'door.location', doc: () => {}, status: 'meets' },
  { name: 'hinge left, sign left (hinge side) fails', section: '703.4.2', source: 'S3', rule: 'door.location', doc: door({}, { mount: 'wall', side: 'left', offsetFromDoor: 6 }), status: 'fails' },
  { name: 'hinge right, sign left (latch side) meets', section: '703.4.2', source: 'S3', rule: 'door.location', doc: door({ hingeSide: 'right' }, { mount: 'wall', side: 'left', offsetFromDoor: 6 }), status: 'meets' },
  { name: 'no wall at the latch side: nearest wall is advisory', section: '703.4.2', source: 'S3', rule: 'door.location', doc: door({ latchSideWallAvailable: false }, { mount: 'wall', side: 'left', offsetFromDoor: 6 }), status: 'advisory' },
  { name: 'double doors, both active: right of the right-hand door meets', section: '703.4.2', source: 'S3', rule: 'door.location', requirement: 'door.double-both-active', doc: door({ leaves: 'double', activeLeaves: 'both' }), status: 'meets' },
  { name: 'double doors, both active: left side fails', section: '703.4.2', source: 'S3', rule: 'door.location', requirement: 'door.double-both-active', doc: door({ leaves: 'double', activeLeaves: 'both' }, { mount: 'wall', side: 'left', offsetFromDoor: 6 }), status: 'fails' },
  { name: 'double doors, left leaf active: sign on the inactive right leaf meets', section: '703.4.2', source: 'S3', rule: 'door.location', requirement: 'door.double-one-active', doc: door({ leaves: 'double', activeLeaves: 'left' }, { mount: 'door-leaf', leaf: 'right' }), status: 'meets' },
  { name: 'double doors, left leaf active: sign on the wall fails', section: '703.4.2', source: 'S3', rule: 'door.location', requirement: 'door.double-one-active', doc: door({ leaves: 'double', activeLeaves: 'left' }), status: 'fails' },
  { name: 'double doors, left leaf active: sign on the active leaf (pull side) fails', section: '703.4.2', source: 'S3', rule: 'door.location', requirement: 'door.double-one-active', doc: door({ leaves: 'double', activeLeaves: 'left' }, { mount: 'door-leaf', leaf: 'left' }), status: 'fails' },
  { name: 'push-side exception: on the leaf, push side, closer, no hold-open meets', section: '703.4.2 Exception', source: 'S3', rule: 'door.location', requirement: 'door.push-side-exception', doc: door({ swing: 'away-from-sign-side', closer: true, holdOpen: false }, { mount: 'door-leaf', leaf: 'left' }), status: 'meets' },
  { name: 'push-side exception lost with a hold-open device', section: '703.4.2 Exception', source: 'S3', rule: 'door.location', requirement: 'door.push-side-exception', doc: door({ swing: 'away-from-sign-side', closer: true, holdOpen: true }, { mount: 'door-leaf', leaf: 'left' }), status: 'fails' },
  { name: 'push-side exception needs a closer', section: '703.4.2 Exception', source: 'S3', rule: 'door.location', requirement: 'door.push-side-exception', doc: door({ swing: 'away-from-sign-side', closer: false }, { mount: 'door-leaf', leaf: 'left' }), status: 'fails' },
  { name: 'sign on the pull side of the leaf fails', section: '703.4.2 Exception', source: 'S3', rule: 'door.location', requirement: 'door.push-side-exception', doc: door({ swing: 'toward-sign-side' }, { mount: 'door-leaf', leaf: 'left' }), status: 'fails' },
  { name: 'room sign with no door described: advisory (unchecked, not met)', section: '703.4.2', source: 'S3', rule: 'door.location', doc: (d) => { d.installation.door = null }, status: 'advisory' },
  { name: 'room sign with no door described: clear floor advisory', section: '703.4.2', source: 'S3', rule: 'door.clear-floor', doc: (d) => { d.installation.door = null }, status: 'advisory' },
  { name: 'hoistway jamb: door location not applicable', section: '703.4.2', source: 'S27', rule: 'door.location', doc: (d) => { d.installation.door = null; d.installation.signType = 'hoistway-jamb' }, status: 'not-applicable' },
]

/** Put the tactile characters' centre `gap` beyond the edge of the 36 in door opening (square edge = centre − 9). */
const clearGap = (gap: number, extra: (d: LayoutDocument) => void = () => {}) => (d: LayoutDocument) => {
  extra(d)
  const t = measureText(el(d, 't1', 'raised-text'), fonts.get('b612')!)
  const b = el(d, 'b1', 'braille')
  // Tactile extent = text ink ∪ braille cells; braille starts at the ink's left, 10 cells wide.
  const right = Math.max(t.ink.maxX, b.position.x + 9 * b.dots.cellPitch + b.dots.spacing + b.dots.diameter)
  const centre = (t.ink.minX + right) / 2
  d.installation.location = { mount: 'wall', side: 'right', offsetFromDoor: 9 + gap - centre }
}

const floor: RuleCase[] = [
  { name: 'square 2 in beyond the swing meets', section: '703.4.2', source: 'S3', rule: 'door.clear-floor', doc: clearGap(2), status: 'meets', measured: 2, tol: 1e-6 },
  { name: 'square touching the swing at the wall meets (beyond the arc)', section: '703.4.2', source: 'S3', rule: 'door.clear-floor', doc: clearGap(0), status: 'meets', measured: 0, tol: 1e-6 },
  { name: 'square 0.5 in into the swing fails', section: '703.4.2', source: 'S3', rule: 'door.clear-floor', doc: clearGap(-0.5), status: 'fails', measured: -0.5, tol: 1e-6 },
  { name: 'square 6 in into the swing fails', section: '703.4.2', source: 'S3', rule: 'door.clear-floor', doc: clearGap(-6), status: 'fails', measured: -6, tol: 1e-6 },
  { name: 'door swinging away from the sign side: floor not swept', section: '703.4.2', source: 'S3', rule: 'door.clear-floor', doc: clearGap(-6, door({ swing: 'away-from-sign-side' })), status: 'meets' },
  { name: 'hinge on the sign side, square starting at the frame: clear of the wedge', section: '703.4.2', source: 'S3', rule: 'door.clear-floor', doc: clearGap(0, door({ hingeSide: 'right' })), status: 'meets' },
  { name: 'hinge on the sign side, square 6 in over the opening: hits the wedge at the hinge', section: '703.4.2', source: 'S3', rule: 'door.clear-floor', doc: clearGap(-6, door({ hingeSide: 'right' })), status: 'fails' },
  { name: 'double doors both active: square at the right frame is clear', section: '703.4.2', source: 'S3', rule: 'door.clear-floor', doc: clearGap(0, door({ leaves: 'double', activeLeaves: 'both' })), status: 'meets', measured: 0, tol: 1e-6 },
  { name: 'double doors both active: square 2 in over the right leaf fails', section: '703.4.2', source: 'S3', rule: 'door.clear-floor', doc: clearGap(-2, door({ leaves: 'double', activeLeaves: 'both' })), status: 'fails' },
  { name: 'sign on the hinge-side wall, 2 in from a door swinging toward it: square hit', section: '703.4.2', source: 'S3', rule: 'door.clear-floor', doc: door({ hingeSide: 'right' }, { mount: 'wall', side: 'left', offsetFromDoor: 2 }), status: 'fails' },
  { name: 'metric: 455 mm square 50 mm beyond the swing meets', section: '703.4.2', source: 'S3', units: 'mm', rule: 'door.clear-floor', doc: (d) => { d.installation.location = { mount: 'wall', side: 'right', offsetFromDoor: 227.5 + 50 - 93 } }, status: 'meets' },
]

describe('installation rules (table cases)', () => {
  for (const c of [...heights, ...location, ...floor]) it(`${c.section}: ${c.name}`, () => { runCase(c) })
})
