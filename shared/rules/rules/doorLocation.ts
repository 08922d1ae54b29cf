import type { Rule, RuleResult } from '../types'

/**
 * §703.4.2: where a tactile sign is at a door — latch side of a single door;
 * inactive leaf of a double door with one active leaf; right of the right-hand
 * door when both leaves are active; nearest adjacent wall when there is no wall
 * space there. Exception: on the push side of a door with a closer and no
 * hold-open device (read as permitting the sign on the door leaf itself).
 */
export const doorLocation: Rule = {
  id: 'door.location',
  requirement: 'door.latch-side',
  section: '703.4.2',
  title: 'Sign location at the door',
  topic: 'installation',
  appliesTo: { signs: 'tactile', except: { 'elevator-car-control': 'car controls are not signs at a door', 'hoistway-jamb': 'hoistway signs go on both jambs (407.2.3.1)' } },
  messages: {
    meets: (d) => `${d.detail}`,
    fails: (d) => `${d.detail}`,
    advisory: (d) => `${d.detail}`,
    'not-applicable': (d) => `Location at the door not checked: ${d.detail}.`,
  },
  evaluate({ doc }) {
    const { door, location } = doc.installation
    if (!door || !location) {
      // Room, restroom and exit signs are normally at a door: without one described, 703.4.2 is unchecked, not met.
      const atDoor = ['room-identification', 'restroom', 'exit'].includes(doc.installation.signType)
      return [{ status: atDoor ? 'advisory' : 'not-applicable', requirement: 'door.latch-side', elements: [], data: { detail: atDoor ? 'The door is not described in the installation context, so the location at the door (703.4.2) was not checked; add the door to check it.' : 'no door in the installation context' } }]
    }
    const r = (status: RuleResult['status'], requirement: RuleResult['requirement'], detail: string): RuleResult[] => [{ status, requirement, elements: [], data: { detail } }]
    const pushSideOk = door.swing === 'away-from-sign-side' && door.closer && !door.holdOpen
    if (location.mount === 'door-leaf') {
      if (door.leaves === 'double' && door.activeLeaves !== 'both') {
        const inactive = door.activeLeaves === 'left' ? 'right' : 'left'
        if (location.leaf === inactive) return r('meets', 'door.double-one-active', `The sign is on the inactive (${inactive}) leaf of the double door, as required.`)
        if (pushSideOk) return r('meets', 'door.push-side-exception', `The sign is on the active ${location.leaf} leaf, on its push side with a closer and no hold-open device (exception).`)
        return r('fails', 'door.double-one-active', `The sign is on the active ${location.leaf} leaf; with one active leaf it belongs on the inactive (${inactive}) leaf.`)
      }
      if (pushSideOk) return r('meets', 'door.push-side-exception', 'The sign is on the door leaf, on the push side of a door with a closer and no hold-open device (exception).')
      const why = door.swing !== 'away-from-sign-side' ? 'the sign side is the pull side' : !door.closer ? 'the door has no closer' : 'the door has a hold-open device'
      return r('fails', 'door.push-side-exception', `The sign is on the door leaf, but ${why}; the exception needs the push side of a door with a closer and no hold-open device. Move it to the wall at the latch side.`)
    }
    // Wall mount.
    if (door.leaves === 'double') {
      if (door.activeLeaves === 'both') {
        if (location.side === 'right') return r('meets', 'door.double-both-active', 'The sign is on the wall to the right of the right-hand door of the double door.')
        if (!door.latchSideWallAvailable) return r('advisory', 'door.double-both-active', 'The sign is to the left of the double door because there is no wall space on the right; the nearest adjacent wall is allowed — confirm it is the nearest.')
        return r('fails', 'door.double-both-active', 'With both leaves active the sign belongs to the right of the right-hand door; it is on the left.')
      }
      if (!door.latchSideWallAvailable) return r('advisory', 'door.double-one-active', 'With one active leaf the sign belongs on the inactive leaf; it is on the wall — acceptable only where the leaf cannot carry it (confirm with the AHJ).')
      return r('fails', 'door.double-one-active', `With one active leaf the sign belongs on the inactive (${door.activeLeaves === 'left' ? 'right' : 'left'}) leaf; it is on the wall.`)
    }
    const latch = door.hingeSide === 'left' ? 'right' : 'left'
    if (location.side === latch) return r('meets', 'door.latch-side', `The sign is on the latch side (${latch}) of the door.`)
    if (!door.latchSideWallAvailable) return r('advisory', 'door.latch-side', `The sign is on the hinge side because there is no wall space at the latch side; the nearest adjacent wall is allowed — confirm it is the nearest.`)
    return r('fails', 'door.latch-side', `The sign is on the hinge side (${location.side}); it belongs alongside the door at the latch side (${latch}).`)
  },
}
