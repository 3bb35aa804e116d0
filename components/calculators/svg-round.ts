/**
 * SVG coordinates rounded to 0.001 user units: the server (Node) and the browser
 * may differ in the last digits of sin/cos, which would break hydration.
 */
export function svgRound(value: number): number {
  return Math.round(value * 1000) / 1000;
}
