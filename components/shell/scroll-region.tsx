/**
 * A wide table's own sideways scroll, so the page itself never scrolls sideways on a phone. It is a focusable,
 * named region: keyboard users can scroll it with the arrow keys.
 */
export function ScrollRegion({ label, className = '', children }: { label: string; className?: string; children: React.ReactNode }) {
  return (
    <div role="region" aria-label={label} tabIndex={0} className={`max-w-full overflow-x-auto ${className}`}>
      {children}
    </div>
  );
}
