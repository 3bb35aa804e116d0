/**
 * The yardstick for layout + SVG: a minimal string-built SVG of a degree wheel's
 * scale (cut circle, a tick per degree in three lengths, a numeral every 10°),
 * computed and written directly with no drawing model in between.
 */

const f = (n: number) => String(Math.round(n * 1e4) / 1e4);

export function bareWheelSvg(diameterMm: number): string {
  const r = diameterMm / 2;
  const c = r + 5;
  const parts = [`<svg xmlns="http://www.w3.org/2000/svg" width="${f(2 * c)}mm" height="${f(2 * c)}mm" viewBox="0 0 ${f(2 * c)} ${f(2 * c)}">`];
  parts.push(`<circle cx="${f(c)}" cy="${f(c)}" r="${f(r)}" fill="none" stroke="#000" stroke-width="0.2"/>`);
  for (let deg = 0; deg < 360; deg += 1) {
    const level = deg % 10 === 0 ? 10 : deg % 5 === 0 ? 5 : 1;
    const depth = level === 10 ? 6 : level === 5 ? 4.5 : 3;
    const a = (deg * Math.PI) / 180;
    const s = Math.sin(a);
    const k = -Math.cos(a);
    parts.push(
      `<line x1="${f(c + r * s)}" y1="${f(c + r * k)}" x2="${f(c + (r - depth) * s)}" y2="${f(c + (r - depth) * k)}" stroke="#000" stroke-width="${level === 1 ? 0.15 : 0.2}" data-crank-deg="${deg}" data-level="${level}"/>`,
    );
    if (level === 10)
      parts.push(
        `<text x="${f(c + (r - 9.4) * s)}" y="${f(c + (r - 9.4) * k)}" font-size="3.2" text-anchor="middle" transform="rotate(${deg} ${f(c + (r - 9.4) * s)} ${f(c + (r - 9.4) * k)})">${deg}</text>`,
      );
  }
  parts.push('</svg>');
  return parts.join('\n');
}
