/** Rimscale's mark: a rim arc with graduations and one amber ignition tick. */
export function Logo({ className = 'h-8 w-8' }: { className?: string }) {
  const ticks = Array.from({ length: 9 }, (_, i) => -60 + i * 15);
  return (
    <svg viewBox="0 0 32 32" className={className} role="img" aria-label="Rimscale logo">
      <circle cx="16" cy="16" r="13" fill="none" stroke="currentColor" strokeWidth="2" />
      <circle cx="16" cy="16" r="2" fill="currentColor" />
      {ticks.map((deg) => {
        const rad = ((deg - 90) * Math.PI) / 180;
        const inner = deg % 30 === 0 ? 8.5 : 10;
        return (
          <line
            key={deg}
            x1={16 + inner * Math.cos(rad)}
            y1={16 + inner * Math.sin(rad)}
            x2={16 + 12 * Math.cos(rad)}
            y2={16 + 12 * Math.sin(rad)}
            stroke="currentColor"
            strokeWidth="1.2"
          />
        );
      })}
      <line x1="16" y1="16" x2="9.5" y2="4.7" stroke="#e8951c" strokeWidth="2.2" strokeLinecap="round" />
    </svg>
  );
}
