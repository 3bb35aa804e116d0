import { cosDeg, radToDeg, sinDeg } from '../angle';

/**
 * A drawing context with the canvas path methods d3-shape calls (moveTo, lineTo, arc,
 * closePath) that samples arcs into points, so a d3 `arc()` becomes plain polygons the
 * printer correction can scale like any other coordinates. d3 hands us radians; they are
 * turned into degrees at once (radians live only in lib/angle.ts).
 */
export type SampledPath = { pointsMm: Array<[number, number]>; closed: boolean };

const MAX_STEP_DEG = 1; // chord error at r = 300 mm: 300·(1 − cos 0.5°) ≈ 0.011 mm

export class SamplingContext {
  readonly paths: SampledPath[] = [];
  private current: SampledPath | undefined;

  constructor(private readonly originMm: readonly [number, number] = [0, 0]) {}

  moveTo(x: number, y: number): void {
    this.current = { pointsMm: [], closed: false };
    this.paths.push(this.current);
    this.push(x, y);
  }

  lineTo(x: number, y: number): void {
    if (!this.current) this.moveTo(x, y);
    else this.push(x, y);
  }

  /** Canvas semantics: angles from +x towards +y (clockwise on a y-down page). */
  arc(x: number, y: number, r: number, startRad: number, endRad: number, anticlockwise = false): void {
    const startDeg = radToDeg(startRad);
    let sweepDeg = radToDeg(endRad) - startDeg;
    if (anticlockwise) sweepDeg = sweepDeg <= -360 ? -360 : -(((-sweepDeg % 360) + 360) % 360);
    else sweepDeg = sweepDeg >= 360 ? 360 : ((sweepDeg % 360) + 360) % 360;
    const steps = Math.max(1, Math.ceil(Math.abs(sweepDeg) / MAX_STEP_DEG));
    for (let i = 0; i <= steps; i += 1) {
      const a = startDeg + (sweepDeg * i) / steps;
      this.lineTo(x + r * cosDeg(a), y + r * sinDeg(a));
    }
  }

  closePath(): void {
    if (this.current) this.current.closed = true;
    this.current = undefined;
  }

  private push(x: number, y: number): void {
    const point: [number, number] = [x + this.originMm[0], y + this.originMm[1]];
    const last = this.current!.pointsMm[this.current!.pointsMm.length - 1];
    if (last && Math.abs(last[0] - point[0]) < 1e-9 && Math.abs(last[1] - point[1]) < 1e-9) return;
    this.current!.pointsMm.push(point);
  }
}
