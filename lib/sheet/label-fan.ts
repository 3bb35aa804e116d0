/**
 * Fanned labels: marks closer together than their labels are thick keep one label each, spread
 * apart to a minimum pitch and joined to their marks by leaders. The spread moves labels as
 * little as possible (least squares), so a cluster fans out symmetrically about its marks and
 * lone marks keep their labels where they are.
 */

const EPS = 1e-9;

/**
 * Positions at least `pitch` apart, in the same order, nearest (least squares) to `wanted`
 * (ascending), kept inside `bounds` when they fit. With w_i = y_i − i·pitch the spacing rule
 * says w must not decrease, so this is isotonic regression, solved by pooling adjacent violators.
 */
export function spreadPositions(wanted: readonly number[], pitch: number, bounds?: readonly [number, number]): number[] {
  const blocks: Array<{ sum: number; count: number }> = [];
  wanted.forEach((value, i) => {
    blocks.push({ sum: value - i * pitch, count: 1 });
    while (blocks.length > 1) {
      const last = blocks[blocks.length - 1]!;
      const before = blocks[blocks.length - 2]!;
      if (before.sum / before.count <= last.sum / last.count + EPS) break;
      before.sum += last.sum;
      before.count += last.count;
      blocks.pop();
    }
  });
  const out: number[] = [];
  for (const block of blocks) for (let k = 0; k < block.count; k += 1) out.push(block.sum / block.count + out.length * pitch);
  if (bounds) {
    // Pushed in from the ends; when all of them cannot fit, the low end wins.
    for (let i = out.length - 1; i >= 0; i -= 1) out[i] = Math.min(out[i]!, i === out.length - 1 ? bounds[1] : out[i + 1]! - pitch);
    for (let i = 0; i < out.length; i += 1) out[i] = Math.max(out[i]!, i === 0 ? bounds[0] : out[i - 1]! + pitch);
  }
  return out;
}

function maxShift(result: ReadonlyMap<number, number>): number {
  let most = 0;
  for (const [wanted, placed] of result) most = Math.max(most, Math.abs(placed - wanted));
  return most;
}

/**
 * Thins the marks (every k-th keeps a label, k = 1, 2, …) until `place` puts the kept ones
 * no farther than `maxShift` from their marks; the others go without (the caller warns).
 */
function thinned(sorted: readonly number[], firstStride: number, maxShiftBy: number, place: (kept: number[]) => Map<number, number>): Map<number, number> {
  let result = new Map<number, number>();
  for (let stride = Math.max(1, firstStride); stride <= sorted.length; stride += 1) {
    result = place(sorted.filter((_, i) => i % stride === 0));
    if (maxShift(result) <= maxShiftBy + EPS) return result;
  }
  return result;
}

function placeOnTurn(kept: readonly number[], pitchDeg: number): Map<number, number> {
  const result = new Map<number, number>();
  let cut = 0; // index of the first mark after the widest gap
  let widest = -Infinity;
  kept.forEach((value, i) => {
    const previous = i === 0 ? kept[kept.length - 1]! - 360 : kept[i - 1]!;
    if (value - previous > widest) [widest, cut] = [value - previous, i];
  });
  const unrolled = [...kept.slice(cut), ...kept.slice(0, cut).map((v) => v + 360)];
  const spread = spreadPositions(unrolled, pitchDeg);
  const firstTurn = kept.length - cut;
  unrolled.forEach((value, i) => result.set(i < firstTurn ? value : value - 360, spread[i]! - (i < firstTurn ? 0 : 360)));
  return result;
}

/**
 * The same round a turn (degrees): the circle is cut at the widest gap between marks, so a
 * cluster across 0/360 stays together. Each distinct position maps to its label position
 * (same turn as given, possibly outside 0–360). When the labels cannot all be `pitchDeg`
 * apart and within `maxShiftDeg` of their marks, every k-th mark keeps a label.
 */
export function spreadOnTurn(wantedDeg: readonly number[], pitchDeg: number, maxShiftDeg = 180): Map<number, number> {
  const sorted = [...new Set(wantedDeg)].sort((a, b) => a - b);
  if (!sorted.length || !(pitchDeg > 0)) return new Map();
  const firstStride = Math.ceil((sorted.length * pitchDeg) / (360 - pitchDeg));
  return thinned(sorted, firstStride, maxShiftDeg, (kept) => placeOnTurn(kept, pitchDeg));
}

/** The same along a line inside [lo, hi] (a strip row), with the same thinning. */
export function spreadInRange(wanted: readonly number[], pitch: number, [lo, hi]: readonly [number, number], maxShiftBy = Infinity): Map<number, number> {
  const sorted = [...new Set(wanted)].sort((a, b) => a - b);
  if (!sorted.length || !(pitch > 0)) return new Map();
  const capacity = Math.max(1, Math.floor((hi - lo) / pitch + EPS) + 1);
  return thinned(sorted, Math.ceil(sorted.length / capacity), maxShiftBy, (kept) => {
    const spread = spreadPositions(kept, pitch, [lo, hi]);
    return new Map(kept.map((value, i) => [value, spread[i]!]));
  });
}
