import { cosDeg, normalizeDeg, sinDeg } from '@/lib/angle';
import { deadCentres, offsetPistonDropMm } from '@/lib/engine/offset-slider-crank';
import { formatLength, type LengthUnit } from '@/lib/fields/length';
import { formatDeg } from '@/lib/format/number-format';
import { useReaderLocale } from '@/components/format/reader-locale';
import { svgRound } from './svg-round';

type CrankDiagramProps = { strokeMm: number; rodMm: number; crankDeg: number; pinOffsetMm?: number; unit: LengthUnit };

/**
 * Crank, con-rod and piston drawn to scale at `crankDeg` (0 = piston TDC, turning clockwise
 * on screen), with the piston drop below the TDC crown line dimensioned on the right.
 * The bore is not known here, so the piston is drawn one stroke wide. A wrist-pin offset
 * moves the bore line (and the piston) sideways by e, positive to the right: the side the
 * crank pin swings to just after TDC. The crank then stands asin(e/(l + a)) past the
 * vertical at piston TDC (offset-slider-crank.ts).
 */
export function CrankDiagram({ strokeMm, rodMm, crankDeg, pinOffsetMm = 0, unit }: CrankDiagramProps) {
  const locale = useReaderLocale();
  const a = strokeMm / 2;
  const e = pinOffsetMm;
  const { tdcHeightMm, tdcPhiDeg } = deadCentres({ strokeMm, rodMm, pinOffsetMm });
  const dropMm = offsetPistonDropMm({ strokeMm, rodMm, crankDeg, pinOffsetMm });
  const pinY = svgRound(tdcHeightMm - dropMm); // wrist pin height above the crank axis
  const phiDeg = tdcPhiDeg + crankDeg; // crank angle from the vertical through the crank axis
  const crankPin = { x: svgRound(a * sinDeg(phiDeg)), y: svgRound(a * cosDeg(phiDeg)) };
  const pistonHalfWidth = a;
  const boreX = svgRound(e);
  const crownAbovePin = 0.6 * a;
  const skirtBelowPin = 0.6 * a;
  const tdcCrownY = tdcHeightMm + crownAbovePin;
  const crownY = pinY + crownAbovePin;
  const top = tdcCrownY + 0.35 * a;
  const bottom = -1.35 * a;
  const height = top - bottom;
  const left = Math.min(-1.45 * a, e - 1.45 * a);
  const fontSize = height * 0.042;
  const dimX = e + pistonHalfWidth + 0.45 * a;
  const dropLabel = formatLength(dropMm, unit, locale);
  // Room on the right for the dimension's text (mono figures are about 0.62 em wide).
  const right = dimX + 0.15 * a + fontSize * 0.62 * (dropLabel.length + 1);
  const angleRadius = 0.55 * a;
  const shownDeg = normalizeDeg(crankDeg);
  // SVG's y runs down: every y below is negated.
  const arcStart = { x: svgRound(angleRadius * sinDeg(tdcPhiDeg)), y: svgRound(-angleRadius * cosDeg(tdcPhiDeg)) };
  const arcEnd = { x: svgRound(angleRadius * sinDeg(tdcPhiDeg + shownDeg)), y: svgRound(-angleRadius * cosDeg(tdcPhiDeg + shownDeg)) };
  const tdcRay = { x: svgRound(1.3 * a * sinDeg(tdcPhiDeg)), y: svgRound(-1.3 * a * cosDeg(tdcPhiDeg)) };
  const line = { vectorEffect: 'non-scaling-stroke' as const, fill: 'none' };

  return (
    <svg
      viewBox={`${left} ${-top} ${right - left} ${height}`}
      className="h-auto w-full max-w-xs"
      role="img"
      aria-label={`Crank at ${formatDeg(shownDeg, locale, { places: 1 })} from TDC; piston ${formatLength(dropMm, unit, locale)} below TDC${e !== 0 ? `; wrist pin offset ${formatLength(e, unit, locale)}` : ''}`}
    >
      <title>Crank and con-rod at the entered angle</title>
      {/* cylinder walls */}
      <line x1={boreX - pistonHalfWidth - 0.05 * a} y1={-top} x2={boreX - pistonHalfWidth - 0.05 * a} y2={-(a + rodMm - strokeMm - skirtBelowPin)} stroke="currentColor" strokeWidth={2} {...line} className="text-steel-400" />
      <line x1={boreX + pistonHalfWidth + 0.05 * a} y1={-top} x2={boreX + pistonHalfWidth + 0.05 * a} y2={-(a + rodMm - strokeMm - skirtBelowPin)} stroke="currentColor" strokeWidth={2} {...line} className="text-steel-400" />
      {/* TDC crown line */}
      <line x1={boreX - pistonHalfWidth} y1={-tdcCrownY} x2={dimX + 0.2 * a} y2={-tdcCrownY} stroke="currentColor" strokeWidth={1} strokeDasharray="4 3" {...line} className="text-spark-600" />
      <text x={boreX - pistonHalfWidth} y={-tdcCrownY - fontSize * 0.4} fontSize={fontSize} className="fill-spark-600">
        TDC
      </text>
      {/* crank web and axis */}
      <circle cx={0} cy={0} r={1.2 * a} stroke="currentColor" strokeWidth={1} {...line} className="text-steel-300" />
      <circle cx={0} cy={0} r={0.08 * a} className="fill-steel-700 dark:fill-steel-200" />
      {shownDeg > 0.05 && shownDeg < 359.95 ? (
        <path
          d={`M ${arcStart.x} ${arcStart.y} A ${angleRadius} ${angleRadius} 0 ${shownDeg > 180 ? 1 : 0} 1 ${arcEnd.x} ${arcEnd.y}`}
          stroke="currentColor"
          strokeWidth={1}
          {...line}
          className="text-gauge-600"
        />
      ) : null}
      <line x1={0} y1={0} x2={tdcRay.x} y2={tdcRay.y} stroke="currentColor" strokeWidth={0.75} strokeDasharray="2 2" {...line} className="text-steel-400" />
      {e !== 0 ? (
        <g data-testid="pin-offset">
          {/* bore axis through the wrist pin, the crank's vertical, and the offset between them */}
          <line x1={boreX} y1={-top} x2={boreX} y2={-(a + rodMm - strokeMm - skirtBelowPin)} stroke="currentColor" strokeWidth={0.75} strokeDasharray="6 2 1 2" {...line} className="text-gauge-600" />
          <line x1={0} y1={0.2 * a} x2={0} y2={-top} stroke="currentColor" strokeWidth={0.5} strokeDasharray="1 3" {...line} className="text-steel-400" />
          <line x1={0} y1={-(tdcCrownY + 0.2 * a)} x2={boreX} y2={-(tdcCrownY + 0.2 * a)} stroke="currentColor" strokeWidth={1.5} {...line} className="text-gauge-600" />
          <text x={Math.max(0, boreX) + 0.1 * a} y={-(tdcCrownY + 0.25 * a)} fontSize={fontSize * 0.8} fontFamily="var(--font-figures), monospace" className="fill-gauge-700 dark:fill-gauge-500">
            {`e ${formatLength(e, unit, locale)}`}
          </text>
        </g>
      ) : null}
      {/* throw and rod */}
      <line x1={0} y1={0} x2={crankPin.x} y2={-crankPin.y} stroke="currentColor" strokeWidth={4} strokeLinecap="round" {...line} className="text-gauge-600" />
      <line x1={crankPin.x} y1={-crankPin.y} x2={boreX} y2={-pinY} stroke="currentColor" strokeWidth={3} strokeLinecap="round" {...line} className="text-steel-600 dark:text-steel-300" />
      <circle cx={crankPin.x} cy={-crankPin.y} r={0.09 * a} className="fill-gauge-600" />
      {/* piston */}
      <rect
        x={boreX - pistonHalfWidth}
        y={-crownY}
        width={2 * pistonHalfWidth}
        height={crownAbovePin + skirtBelowPin}
        stroke="currentColor"
        strokeWidth={1.5}
        {...line}
        className="text-steel-800 dark:text-steel-100"
      />
      <circle cx={boreX} cy={-pinY} r={0.1 * a} className="fill-steel-700 dark:fill-steel-200" />
      {/* drop dimension */}
      <line x1={boreX + pistonHalfWidth} y1={-crownY} x2={dimX + 0.2 * a} y2={-crownY} stroke="currentColor" strokeWidth={1} {...line} className="text-steel-500" />
      <line x1={dimX} y1={-tdcCrownY} x2={dimX} y2={-crownY} stroke="currentColor" strokeWidth={1.5} {...line} className="text-spark-600" />
      <text x={dimX + 0.15 * a} y={-(tdcCrownY + crownY) / 2} fontSize={fontSize} dominantBaseline="middle" fontFamily="var(--font-figures), monospace" className="fill-current">
        {dropLabel}
      </text>
      <text x={0.25 * a} y={-0.7 * a} fontSize={fontSize} className="fill-gauge-700 dark:fill-gauge-500">
        {`${formatDeg(shownDeg, locale, { places: 1 })}`}
      </text>
    </svg>
  );
}
