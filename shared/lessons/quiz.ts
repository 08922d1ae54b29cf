/**
 * Quiz answers, worked out by the engine's own functions from each item's
 * inputs. Nothing is stored as an answer, so a change to a standard's data or
 * to an example's document changes the expected answer with it.
 */
import { mountingHeightFor } from '../geometry/placement'
import { measureLayout, type MeasureContext } from '../rules/measure'
import type { CheckReport } from '../rules/types'
import type { LayoutDocument, Units } from '../schema/layout'
import { getStandard, rangeFor, visualMinHeight, type RequirementKey, type StandardId } from '../standards'
import type { LessonExample, QuizItem } from './schema'
import { selectFindings } from './select'

export interface QuizAnswer {
  value: number
  unit: string
  /** How the number was worked out, shown after the trainee answers. */
  explanation: string
}

export interface QuizContext extends MeasureContext {
  /** Examples of the lesson the item belongs to. */
  examples: readonly LessonExample[]
  /** Run the engine on a document (the server's check, cached per standard). */
  check(doc: LayoutDocument, standard: StandardId): CheckReport
}

const round = (v: number, d = 4) => Math.round(v * 10 ** d) / 10 ** d

/**
 * Allowed plate-bottom range for a plate: the heights that put the lowest
 * tactile baseline at the standard's minimum and the highest at its maximum
 * (703.4.1). Braille baselines count toward the minimum where the standard
 * measures to them (A117.1, CBC 11B as read here).
 */
export function plateBottomRange(doc: LayoutDocument, standard: StandardId, ctx: MeasureContext): { lowest: number; highest: number; unit: Units } {
  const std = getStandard(standard)
  const m = measureLayout(doc, ctx)
  const raisedBaselines = m.raised.flatMap((t) => t.lines.map((l) => l.baselineY))
  if (raisedBaselines.length === 0) throw new Error('the plate has no raised characters')
  let lowestY = Math.max(...raisedBaselines)
  const minKey: RequirementKey = 'mount.tactile-min'
  let minAff = rangeFor(std.requirements[minKey], doc.units)!.range.min!
  if (std.options.brailleCountsForMinHeight) {
    const brailleMin = rangeFor(std.requirements['mount.braille-min'], doc.units)!.range.min!
    for (const b of m.braille) {
      for (const line of b.block.lines) {
        if (line.cells === 0) continue
        // Whichever of the two baselines asks for the higher plate governs.
        if (mountingHeightFor(line.baseline, doc.plate.height, brailleMin) > mountingHeightFor(lowestY, doc.plate.height, minAff)) {
          lowestY = line.baseline
          minAff = brailleMin
        }
      }
    }
  }
  const maxAff = rangeFor(std.requirements['mount.tactile-max'], doc.units)!.range.max!
  const highestY = Math.min(...raisedBaselines)
  return {
    lowest: mountingHeightFor(lowestY, doc.plate.height, minAff),
    highest: mountingHeightFor(highestY, doc.plate.height, maxAff),
    unit: doc.units,
  }
}

/** The expected answer of a quiz item. Throws when the item names something that does not exist (a content error). */
export function quizAnswer(item: QuizItem, ctx: QuizContext): QuizAnswer {
  const std = getStandard(item.standard)
  switch (item.kind) {
    case 'visual-min-height': {
      const r = visualMinHeight(std.visualHeightTable, item.units, item.baselineHeight, item.viewingDistance)
      const base = std.visualHeightTable[item.units].bands[r.band - 1]!
      const explanation = r.beyondThreshold
        ? `${std.visualHeightTable.section}, row ${r.band}: ${fmtN(base.base)} ${item.units} plus ${fmtN(std.visualHeightTable[item.units].perStep)} ${item.units} for each of the ${fmtN(r.steps)} ${item.units === 'in' ? 'feet' : 'steps of 305 mm'} beyond ${fmtN(base.threshold)} ${item.units}.`
        : `${std.visualHeightTable.section}, row ${r.band}: the viewing distance is below ${fmtN(base.threshold)} ${item.units}, so the base value applies.`
      return { value: round(r.min), unit: item.units, explanation }
    }
    case 'limit-from-height': {
      const req = std.requirements[item.requirement as RequirementKey]
      if (!req) throw new Error(`unknown requirement "${item.requirement}"`)
      const r = rangeFor(req, item.units)
      const pct = r?.unit === '%' ? r.range[item.bound] : undefined
      if (pct === undefined) throw new Error(`requirement "${item.requirement}" has no ${item.bound} percentage`)
      return {
        value: round((pct / 100) * item.capHeight),
        unit: item.units,
        explanation: `${req.section}: ${fmtN(pct)} % of ${fmtN(item.capHeight)} ${item.units}.`,
      }
    }
    case 'measured': {
      const ex = ctx.examples.find((e) => e.id === item.example)
      if (!ex) throw new Error(`unknown example "${item.example}"`)
      const f = selectFindings(ctx.check(ex.document, item.standard).findings, item.match).find((x) => x.measured)
      if (!f?.measured) throw new Error(`example "${item.example}" has no measured "${item.match}" under ${item.standard}`)
      return { value: round(f.measured.value), unit: f.measured.unit, explanation: `Measured by the engine (${f.section}): ${f.message}` }
    }
    case 'plate-bottom': {
      const ex = ctx.examples.find((e) => e.id === item.example)
      if (!ex) throw new Error(`unknown example "${item.example}"`)
      const r = plateBottomRange(ex.document, item.standard, ctx)
      const v = item.bound === 'lowest' ? r.lowest : r.highest
      return {
        value: round(v),
        unit: r.unit,
        explanation: `${std.requirements['mount.tactile-min'].section}: plate bottom from ${fmtN(r.lowest)} ${r.unit} to ${fmtN(r.highest)} ${r.unit} keeps the tactile baselines in the band.`,
      }
    }
  }
}

/** Whether a trainee's number is right within the item's tolerance. */
export function isCorrect(item: QuizItem, answer: QuizAnswer, value: number): boolean {
  return Number.isFinite(value) && Math.abs(value - answer.value) <= item.tolerance + 1e-9
}

function fmtN(v: number): string {
  return String(Math.round(v * 1000) / 1000)
}
