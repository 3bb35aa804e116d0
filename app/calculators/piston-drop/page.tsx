import type { Metadata } from 'next';
import { PistonDropCalculator } from '@/components/calculators/piston-drop-calculator';
import { SafetyPanel } from '@/components/generator/safety-panel';

export const metadata: Metadata = { title: 'Piston drop ⇄ crank angle' };

export default function PistonDropPage() {
  return (
    <section className="space-y-4">
      <h1 className="text-2xl font-bold">Piston drop ⇄ crank angle</h1>
      <p className="max-w-3xl text-sm text-steel-600 dark:text-steel-300">
        Slider-crank geometry: with stroke and con-rod length, a crank angle from TDC gives how far the piston has dropped
        below TDC, and a drop gives the angle. Use it to turn timing quoted in mm before TDC into degrees before TDC and
        back. A wrist pin offset from the cylinder axis (enter 0 for a centred pin) moves TDC a little past the
        crank’s vertical and makes the piston pass a given height at different angles going down (ATDC) and
        coming up (BTDC); both are shown.
      </p>
      <PistonDropCalculator />
      <SafetyPanel />
    </section>
  );
}
