/**
 * The figure route's answer (a FigureResult) from the stored JSON of the result without its
 * `cached` field: the flag is appended to the object's text, so a cache hit costs no
 * serialization, however large the figure's data.
 */
export function presentFigureJson(storedJson: string, cached: boolean): string {
  // storedJson is JSON.stringify of a non-empty object, so it ends with "}".
  return `${storedJson.slice(0, -1)},"cached":${cached}}`;
}
