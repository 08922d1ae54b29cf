/** A comment marker on the read-only drawing (plate coordinates, document units). */
export interface DrawingPin {
  id: string
  label: string
  x: number
  y: number
  /** Read by screen readers on the marker. */
  text: string
}
