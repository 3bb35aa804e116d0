import type { Metadata } from 'next';
import { ArcChordCalculator } from '@/components/calculators/arc-chord-calculator';

export const metadata: Metadata = { title: 'Divider distances' };

export default function ArcChordPage() {
  return (
    <section className="space-y-4">
      <h1 className="text-2xl font-bold">Divider distances</h1>
      <p className="max-w-3xl text-sm text-steel-600 dark:text-steel-300">
        To mark timing straight onto a flywheel: the distance from the TDC mark round the rim (arc, for a tape or a flexible
        rule) and straight across (chord, for dividers), for each angle.
      </p>
      <ArcChordCalculator />
    </section>
  );
}
