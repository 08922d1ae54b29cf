/**
 * Typical raised sign text (our own list of common room and facility words, written for tests
 * and benchmarks; not taken from any product). Used by the liblouis cross-check and the bench.
 */
export const SIGN_WORDS: readonly string[] = [
  'ROOM', 'OFFICE', 'CONFERENCE', 'CONFERENCE ROOM', 'WOMEN', 'MEN', 'RESTROOM', 'FAMILY RESTROOM',
  'ALL GENDER RESTROOM', 'UNISEX', 'TOILET', 'SHOWER', 'LOCKER ROOM', 'ELEVATOR', 'STAIR', 'STAIRS',
  'STAIRWAY', 'EXIT', 'EXIT STAIR DOWN', 'EXIT STAIR UP', 'EXIT RAMP DOWN', 'EXIT RAMP UP', 'EXIT ROUTE',
  'TO EXIT', 'NO EXIT', 'LIBRARY', 'STORAGE', 'MECHANICAL', 'ELECTRICAL', 'JANITOR', 'CUSTODIAL',
  'KITCHEN', 'BREAK ROOM', 'LOUNGE', 'STAFF LOUNGE', 'STAFF ONLY', 'RECEPTION', 'WAITING ROOM',
  'WAITING AREA', 'CLASSROOM', 'LABORATORY', 'LAB', 'ENTRANCE', 'MAIN ENTRANCE', 'EMERGENCY',
  'KNOWLEDGE CENTER', 'INFORMATION', 'NURSE STATION', 'NURSES STATION', 'COMPUTER ROOM', 'FIRST AID',
  'LACTATION ROOM', 'MOTHERS ROOM', 'QUIET ROOM', 'MEETING ROOM', 'TRAINING ROOM', 'COPY ROOM',
  'MAIL ROOM', 'FILE ROOM', 'RECORDS', 'MEDICAL RECORDS', 'PHARMACY', 'LABORATORY SERVICES', 'RADIOLOGY',
  'X-RAY', 'EXAM ROOM', 'EXAM', 'TREATMENT ROOM', 'CONSULTATION', 'PATIENT ROOM', 'SOILED UTILITY',
  'CLEAN UTILITY', 'CLEAN LINEN', 'NOURISHMENT', 'TELEPHONE', 'DATA', 'SERVER ROOM', 'IT CLOSET',
  'TELECOM', 'FIRE PUMP', 'FIRE RISER', 'SPRINKLER', 'BOILER ROOM', 'GENERATOR', 'ROOF ACCESS',
  'LOADING DOCK', 'RECEIVING', 'SHIPPING', 'CAFETERIA', 'DINING', 'VENDING', 'CHAPEL', 'GYMNASIUM',
  'FITNESS CENTER', 'POOL', 'LOCKERS', 'ADMINISTRATION', 'ACCOUNTING', 'HUMAN RESOURCES', 'DIRECTOR',
  'MANAGER', 'SUPERVISOR', 'SECURITY', 'LOBBY', 'VESTIBULE', 'CORRIDOR', 'AREA OF REFUGE',
  'AREA OF RESCUE ASSISTANCE', 'ASSEMBLY AREA', 'NORTH', 'SOUTH', 'EAST', 'WEST', 'FLOOR', 'LEVEL',
  'BASEMENT', 'PENTHOUSE', 'PARKING', 'GARAGE', 'LAUNDRY', 'WORKROOM', 'STUDIO', 'THEATER', 'AUDITORIUM',
  'STAGE', 'GREEN ROOM', 'DRESSING ROOM', 'CHILD CARE', 'NURSERY', 'PLAYROOM', 'SUITE', 'WING',
  'STUDY ROOM', 'READING ROOM', 'ARCHIVES', 'COUNSELING', 'SOCIAL SERVICES', 'BILLING', 'CASHIER',
  'CHECK IN', 'CHECK OUT', 'PUSH', 'PULL', 'KEEP CLOSED', 'AUTHORIZED PERSONNEL ONLY',
  'FIRE EXTINGUISHER', 'EYE WASH', 'HAZARDOUS MATERIALS', 'DO NOT ENTER', 'ENTER', 'WELCOME',
]

/** Room numbers and letter-number designations (numbers handled by the numeric indicator). */
export const SIGN_NUMBERS: readonly string[] = ['101', '102', '110A', '2B', '204', '1', '12', '305', 'B12', '1000']

/**
 * `count` sign strings made by cycling through the word list and adding room numbers to every
 * other one (deterministic, no randomness: benchmarks must be comparable run to run).
 */
export function sampleSignStrings(count: number): string[] {
  const out: string[] = []
  for (let i = 0; i < count; i++) {
    const word = SIGN_WORDS[i % SIGN_WORDS.length]
    const n = SIGN_NUMBERS[Math.floor(i / SIGN_WORDS.length + i) % SIGN_NUMBERS.length]
    out.push(i % 2 === 0 ? `${word} ${n}` : word)
  }
  return out
}
