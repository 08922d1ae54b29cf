/**
 * Rule engine types. A rule is data plus one small function: it reads the
 * measurements (computed once per document) and the standard profile, and
 * returns results; the engine turns them into findings with the section,
 * source and reliability of the requirement they were held to.
 */
import type { Box, LayoutDocument, SignType, Units } from '../schema/layout'
import type { RequirementKey, StandardId, StandardProfile } from '../standards/types'
import type { Measurements } from './measure/types'

export type Status = 'meets' | 'fails' | 'advisory' | 'not-applicable'
export const STATUSES: readonly Status[] = ['meets', 'fails', 'advisory', 'not-applicable']

export type Topic = 'raised-characters' | 'braille' | 'installation' | 'visual-characters' | 'pictogram' | 'contrast' | 'scoping'

/** A measured quantity. Units: 'in' | 'mm' | '%' | ':1' | '×' | 'count'. */
export interface Quantity {
  value: number
  unit: string
}

export interface LimitOut {
  min?: number
  max?: number
  unit: string
}

/** A dimension line for the canvas (plate coordinates, document units). */
export interface Dimension {
  from: { x: number; y: number }
  to: { x: number; y: number }
  /** Text to print on the line, e.g. "0.118 in". */
  label: string
}

/** One judged provision for one element (or the whole sign). */
export interface Finding {
  /** Rule id, e.g. "raised.spacing". */
  rule: string
  /** Section of the selected standard, e.g. "703.2.7" or "11B-703.2.7". */
  section: string
  standard: StandardId
  status: Status
  measured: Quantity | null
  limit: LimitOut | null
  /** Ids of the elements involved. */
  elements: string[]
  /** Area to highlight (plate coordinates, document units). */
  box: Box | null
  message: string
  /** Extra fields. */
  title: string
  topic: Topic
  requirement: RequirementKey
  /** P (primary) · S (secondary) · M (unverified) · D (derived). */
  reliability: 'P' | 'S' | 'M' | 'D'
  sources: string[]
  /** Present when the limit is unverified or interpreted. */
  note?: string
  dimension?: Dimension | null
}

export interface ReportSummary {
  meets: number
  fails: number
  advisory: number
  notApplicable: number
}

export interface CheckReport {
  standard: StandardId
  engineVersion: string
  summary: ReportSummary
  findings: Finding[]
}

/** What a rule's evaluate returns, before the engine adds section, source and message text. */
export interface RuleResult {
  status: Status
  requirement: RequirementKey
  measured?: Quantity | null
  /** Defaults to the requirement's own range in the document's unit system. */
  limit?: LimitOut | null
  elements: string[]
  box?: Box | null
  dimension?: Dimension | null
  /** Values for the message template. */
  data?: MessageData
}

/** Values a message template may print (already formatted). */
export interface MessageData {
  measured?: string
  limit?: string
  subject?: string
  detail?: string
}

export type MessageTemplate = (d: MessageData) => string

/** When the engine runs a rule at all (§216 scoping). */
export interface AppliesTo {
  /** 'tactile': signs that need raised characters and braille; 'visual': every sign with visual characters; 'all'. */
  signs: 'tactile' | 'visual' | 'all'
  /** Further sign types excluded, with the reason printed in the not-applicable finding. */
  except?: Partial<Record<SignType, string>>
  /** Only these sign types (e.g. hoistway rules). */
  only?: SignType[]
}

export interface EvaluateArgs {
  doc: LayoutDocument
  units: Units
  m: Measurements
  std: StandardProfile
  options: CheckOptions
}

export interface Rule {
  id: string
  /** The requirement the rule is mainly held to (its section labels scoping findings). */
  requirement: RequirementKey
  /** ADA section the rule implements (the profile gives each standard's own number). */
  section: string
  title: string
  topic: Topic
  appliesTo: AppliesTo
  /** One template per outcome the rule can produce. */
  messages: Partial<Record<Status, MessageTemplate>> & { 'not-applicable': MessageTemplate }
  evaluate(args: EvaluateArgs): RuleResult[]
}

export interface CheckOptions {
  /** Table 703.5.5: count every started foot instead of the linear default. */
  roundUpFeet?: boolean
}
