import type { Metadata } from 'next';
import { TdcCalculator } from '@/components/calculators/tdc-calculator';
import { SafetyPanel } from '@/components/generator/safety-panel';

export const metadata: Metadata = { title: 'TDC from stop readings' };

export default function TdcPage() {
  return (
    <section className="space-y-4">
      <h1 className="text-2xl font-bold">TDC from stop readings</h1>
      <p className="max-w-3xl text-sm text-steel-600 dark:text-steel-300">
        With a positive stop in the plug hole, turn the crank by hand one way until the piston touches the stop and note
        the wheel reading, then the other way for the second reading. The piston touches the stop at equal angles either
        side of TDC, so true TDC is midway between the two readings, on the short arc between them.
      </p>
      <SafetyPanel />
      <TdcCalculator />
    </section>
  );
}
