import { useReaderLocale } from '@/components/format/reader-locale';
import { formatDeg } from '@/lib/format/number-format';
import { cosDeg, sinDeg } from '@/lib/angle';
import { signedTurnDeg } from '@/lib/engine/tdc-from-stops';
import { svgRound } from './svg-round';

type StopSketchProps = { stopACrankDeg: number; stopBCrankDeg: number; tdcCrankDeg: number };

const R = 80;

function point(deg: number, radius: number) {
  return { x: svgRound(radius * sinDeg(deg)), y: svgRound(-radius * cosDeg(deg)) };
}

/**
 * The wheel as read, 0 at the top and crank order clockwise: the two stop readings,
 * the sweep across TDC between them and the midpoint where true TDC reads.
 */
export function StopSketch({ stopACrankDeg, stopBCrankDeg, tdcCrankDeg }: StopSketchProps) {
  const locale = useReaderLocale();
  const turn = signedTurnDeg(stopACrankDeg, stopBCrankDeg);
  const from = turn >= 0 ? stopACrankDeg : stopBCrankDeg;
  const sweep = Math.abs(turn);
  const start = point(from, R - 14);
  const end = point(from + sweep, R - 14);
  const tdc = point(tdcCrankDeg, R + 2);
  const tdcInner = point(tdcCrankDeg, R - 26);
  return (
    <svg viewBox="-110 -110 220 220" className="h-auto w-full max-w-[16rem]" role="img" aria-label={`Wheel sketch: stops at ${formatDeg(stopACrankDeg, locale)} and ${formatDeg(stopBCrankDeg, locale)} in crank order, true TDC at ${formatDeg(tdcCrankDeg, locale)}`}>
      <title>Stop readings on the wheel</title>
      <circle r={R} fill="none" stroke="currentColor" strokeWidth="1.2" className="text-steel-400" />
      {Array.from({ length: 36 }, (_, i) => i * 10).map((deg) => {
        const outer = point(deg, R);
        const inner = point(deg, R - (deg % 90 === 0 ? 9 : 5));
        return <line key={deg} x1={outer.x} y1={outer.y} x2={inner.x} y2={inner.y} stroke="currentColor" strokeWidth="0.8" className="text-steel-500" />;
      })}
      <text x="0" y={-R - 8} textAnchor="middle" fontSize="9" className="fill-steel-500">
        wheel 0
      </text>
      <path
        d={`M ${start.x} ${start.y} A ${R - 14} ${R - 14} 0 0 1 ${end.x} ${end.y}`}
        fill="none"
        stroke="currentColor"
        strokeWidth="3"
        className="text-gauge-600"
      />
      {[stopACrankDeg, stopBCrankDeg].map((deg, index) => {
        const mark = point(deg, R - 14);
        const label = point(deg, R - 30);
        return (
          <g key={index}>
            <circle cx={mark.x} cy={mark.y} r="4" className="fill-gauge-600" />
            <text x={label.x} y={label.y} textAnchor="middle" dominantBaseline="middle" fontSize="9" className="fill-current">
              {index === 0 ? 'A' : 'B'}
            </text>
          </g>
        );
      })}
      <line x1={tdcInner.x} y1={tdcInner.y} x2={tdc.x} y2={tdc.y} stroke="currentColor" strokeWidth="2.5" className="text-spark-600" />
      <text x="0" y="4" textAnchor="middle" fontSize="10" className="fill-spark-600">
        true TDC
      </text>
    </svg>
  );
}
