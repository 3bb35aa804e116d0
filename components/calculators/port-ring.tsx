import { useReaderLocale } from '@/components/format/reader-locale';
import { formatDeg } from '@/lib/format/number-format';
import { arc } from 'd3-shape'; // d3-shape takes radians: converted with lib/angle at the call
import { cosDeg, degToRad, sinDeg } from '@/lib/angle';
import type { PortTiming } from '@/lib/engine/port-events';
import { svgRound } from './svg-round';

function polar(deg: number, radius: number) {
  return { x: svgRound(radius * sinDeg(deg)), y: svgRound(-radius * cosDeg(deg)) };
}

const BAND_COLOURS = ['#1d546d', '#e8951c', '#2f7fa3', '#c67712', '#4a5861', '#7d8d96'];
const HATCHES = ['', 'url(#port-hatch)', '', 'url(#port-hatch)', '', 'url(#port-hatch)'];

/**
 * Port timing ring: TDC at the top, BDC at the bottom, crank angle increasing
 * clockwise. Each port is one band, from where it opens to where it closes;
 * bands are numbered like the table beside it.
 */
export function PortRing({ ports }: { ports: PortTiming[] }) {
  const locale = useReaderLocale();
  const outer = 100;
  const band = Math.min(14, 70 / Math.max(ports.length, 1));
  const shape = arc<{ innerRadius: number; outerRadius: number; startAngle: number; endAngle: number }>().digits(3);
  const summary = ports
    .map((port) =>
      port.opensDegATDC === null ? `${port.name} never opens` : `${port.name} open ${formatDeg(port.opensDegATDC, locale)} to ${formatDeg(port.closesDegATDC as number, locale)}`,
    )
    .join('; ');
  return (
    <svg viewBox="-140 -130 280 260" className="h-auto w-full max-w-sm" role="img" aria-label={`Port timing ring: ${summary}`}>
      <title>Port timing ring</title>
      <defs>
        <pattern id="port-hatch" width="4" height="4" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
          <line x1="0" y1="0" x2="0" y2="4" stroke="white" strokeWidth="1.2" />
        </pattern>
      </defs>
      <circle r={outer + 4} fill="none" stroke="currentColor" strokeWidth="1" className="text-steel-400" />
      {Array.from({ length: 36 }, (_, i) => i * 10).map((deg) => {
        const from = polar(deg, outer + 4);
        const to = polar(deg, outer + (deg % 90 === 0 ? 12 : 8));
        return (
          <line
            key={deg}
            x1={from.x}
            y1={from.y}
            x2={to.x}
            y2={to.y}
            stroke="currentColor"
            strokeWidth={deg % 90 === 0 ? 1.5 : 0.75}
            className="text-steel-500"
          />
        );
      })}
      <text x="0" y={-outer - 14} textAnchor="middle" fontSize="10" fontWeight="bold" className="fill-current">
        TDC 0°
      </text>
      <text x="0" y={outer + 22} textAnchor="middle" fontSize="10" className="fill-current">
        BDC 180°
      </text>
      <text x={outer + 14} y="3" fontSize="8" className="fill-steel-500">
        90°
      </text>
      <text x={-outer - 14} y="3" fontSize="8" textAnchor="end" className="fill-steel-500">
        270°
      </text>
      {ports.map((port, index) => {
        if (port.opensDegATDC === null || port.closesDegATDC === null) return null;
        const outerRadius = outer - index * band;
        const innerRadius = outerRadius - band + 2;
        const datum = { innerRadius, outerRadius, startAngle: degToRad(port.opensDegATDC), endAngle: degToRad(port.closesDegATDC) };
        const colour = BAND_COLOURS[index % BAND_COLOURS.length];
        const label = polar(port.opensDegATDC, (innerRadius + outerRadius) / 2);
        return (
          <g key={`${port.name}-${index}`}>
            <path d={shape(datum) ?? ''} fill={colour} />
            {HATCHES[index % HATCHES.length] ? <path d={shape(datum) ?? ''} fill={HATCHES[index % HATCHES.length]} /> : null}
            <text
              x={svgRound(label.x + 6)}
              y={label.y}
              fontSize={Math.min(9, band - 3)}
              dominantBaseline="middle"
              className="fill-current"
            >
              {index + 1}
            </text>
          </g>
        );
      })}
      <text x="0" y="4" textAnchor="middle" fontSize="9" className="fill-steel-500">
        turning ↻
      </text>
    </svg>
  );
}
