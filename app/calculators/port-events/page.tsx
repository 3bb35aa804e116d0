import type { Metadata } from 'next';
import { PortEventsCalculator } from '@/components/calculators/port-events-calculator';
import { SafetyPanel } from '@/components/generator/safety-panel';

export const metadata: Metadata = { title: 'Port timing from port heights' };

export default function PortEventsPage() {
  return (
    <section className="space-y-4">
      <h1 className="text-2xl font-bold">Port timing from port heights</h1>
      <p className="max-w-3xl text-sm text-steel-600 dark:text-steel-300">
        A piston-controlled port opens when the crown drops past its top edge, and closes when the crown covers it again
        on the way up. With a centred wrist pin that is the same angle before TDC, so duration is 360° − 2 × the opening
        angle ATDC; with an offset pin the two differ and duration is closing − opening. Blowdown is the angle from
        exhaust opening to the first transfer opening.
      </p>
      <PortEventsCalculator />
      <SafetyPanel />
    </section>
  );
}
