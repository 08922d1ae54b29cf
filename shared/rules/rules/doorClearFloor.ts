import { clearFloorClearance, swingSector } from '../../geometry/placement'
import type { Contour } from '../../geometry/types'
import { boxOf, fmt, limitOf, unionAll } from '../helpers'
import type { Rule } from '../types'

/**
 * §703.4.2: an 18 in × 18 in clear floor space centred on the tactile characters
 * lies beyond the arc of any door swing between closed and 45° open. Plan frame:
 * x along the wall (door opening from 0), y out from the wall; the square runs
 * from the wall face outwards. Only leaves that swing toward the sign side (and,
 * for double doors with one active leaf, only the active one) sweep that floor.
 */
export const doorClearFloor: Rule = {
  id: 'door.clear-floor',
  requirement: 'door.clear-floor',
  section: '703.4.2',
  title: 'Clear floor space beyond the door swing',
  topic: 'installation',
  appliesTo: { signs: 'tactile', except: { 'elevator-car-control': 'car controls are not signs at a door', 'hoistway-jamb': 'hoistway signs go on the jambs (407.2.3.1)' } },
  messages: {
    advisory: (d) => `${d.detail}`,
    meets: (d) => `The ${d.subject} clear floor space centred on the tactile characters ${d.detail}.`,
    fails: (d) => `The ${d.subject} clear floor space centred on the tactile characters ${d.detail}.`,
    'not-applicable': (d) => `Clear floor space not checked: ${d.detail}.`,
  },
  evaluate({ doc, units, m, std }) {
    const { door, location } = doc.installation
    if (!door || !location) {
      // Room, restroom and exit signs are normally at a door: without one described, 703.4.2 is unchecked, not met.
      const atDoor = ['room-identification', 'restroom', 'exit'].includes(doc.installation.signType)
      return [{ status: atDoor ? 'advisory' : 'not-applicable', requirement: 'door.clear-floor', elements: [], data: { detail: atDoor ? 'The door is not described in the installation context, so the location at the door (703.4.2) was not checked; add the door to check it.' : 'no door in the installation context' } }]
    }
    if (m.raised.length === 0) return [{ status: 'not-applicable', requirement: 'door.clear-floor', elements: [], data: { detail: 'no raised characters' } }]
    const { range, unit } = limitOf(std, 'door.clear-floor', units)
    const size = range.min ?? 18
    const W = door.leafWidth
    const total = door.leaves === 'double' ? 2 * W : W
    let plateLeft: number
    if (location.mount === 'wall') plateLeft = location.side === 'right' ? total + location.offsetFromDoor : -location.offsetFromDoor - doc.plate.width
    else plateLeft = (door.leaves === 'double' && location.leaf === 'right' ? W : 0) + (W - doc.plate.width) / 2
    const tactile = unionAll([...m.raised.map((t) => t.ink), ...m.braille.map((b) => b.block.cellBounds)])
    const centre = plateLeft + (tactile.minX + tactile.maxX) / 2
    const x0 = centre - size / 2
    const sectors: Contour[] = []
    if (door.swing === 'toward-sign-side') {
      if (door.leaves === 'single') {
        sectors.push(door.hingeSide === 'left' ? swingSector(0, W, 1, 45) : swingSector(W, W, -1, 45))
      } else {
        if (door.activeLeaves !== 'right') sectors.push(swingSector(0, W, 1, 45))
        if (door.activeLeaves !== 'left') sectors.push(swingSector(2 * W, W, -1, 45))
      }
    }
    const elements = m.raised.map((t) => t.element.id)
    const sq = `${fmt(size, unit)} × ${fmt(size, unit)}`
    if (sectors.length === 0) {
      return [{ status: 'meets', requirement: 'door.clear-floor', measured: null, limit: { min: 0, unit }, elements, box: boxOf(tactile), data: { subject: sq, detail: 'is not swept by the door, which swings away from the sign side' } }]
    }
    const c = clearFloorClearance(x0, size, size, sectors)
    const clearance = Number.isFinite(c.clearance) ? c.clearance : Infinity
    return [{
      status: c.overlaps ? 'fails' : 'meets',
      requirement: 'door.clear-floor',
      measured: Number.isFinite(clearance) ? { value: clearance, unit } : null,
      limit: { min: 0, unit },
      elements,
      box: boxOf(tactile),
      data: {
        subject: sq,
        detail: c.overlaps
          ? `reaches ${fmt(-clearance, unit)} into the door swing (closed to 45°); move the sign ${fmt(-clearance, unit)} farther from the door`
          : Number.isFinite(clearance)
            ? `clears the door swing (closed to 45°) by ${fmt(clearance, unit)}`
            : 'is clear of the door swing (closed to 45°)',
      },
    }]
  },
}
