// @vitest-environment happy-dom
import { describe, expect, it } from 'vitest'
import { svgToPictogram } from '../../../src/editor/svgPictogram'

describe('uploaded SVG pictograms', () => {
  it('keeps only the path data and the view box', () => {
    const r = svgToPictogram('<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 100 120"><title>x</title><path d="M10 10 L90 10 L50 110 Z"/><path d="M0 0h5v5h-5z" fill="red"/></svg>')
    expect(r).toEqual({ ok: true, pathData: 'M10 10 L90 10 L50 110 Z M0 0h5v5h-5z', viewBox: { x: 0, y: 0, width: 100, height: 120 } })
  })
  it('drops scripts, event handlers and foreign content', () => {
    const r = svgToPictogram('<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 10 10" onload="alert(1)"><script>alert(2)</script><foreignObject><div>hi</div></foreignObject><path d="M0 0L10 10" onclick="alert(3)"/></svg>')
    expect(r).toEqual({ ok: true, pathData: 'M0 0L10 10', viewBox: { x: 0, y: 0, width: 10, height: 10 } })
  })
  it('uses width and height when there is no viewBox', () => {
    const r = svgToPictogram('<svg xmlns="http://www.w3.org/2000/svg" width="24" height="30"><path d="M0 0L1 1"/></svg>')
    expect(r).toMatchObject({ ok: true, viewBox: { x: 0, y: 0, width: 24, height: 30 } })
  })
  it('refuses files without paths, with odd path data, or without a size', () => {
    expect(svgToPictogram('<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 1 1"><rect width="1" height="1"/></svg>')).toMatchObject({ ok: false })
    expect(svgToPictogram('not svg at all')).toMatchObject({ ok: false })
    expect(svgToPictogram('<svg xmlns="http://www.w3.org/2000/svg"><path d="M0 0L1 1"/></svg>')).toMatchObject({ ok: false, reason: expect.stringContaining('viewBox') })
    expect(svgToPictogram('x'.repeat(200_001))).toMatchObject({ ok: false, reason: expect.stringContaining('200 KB') })
  })
})
