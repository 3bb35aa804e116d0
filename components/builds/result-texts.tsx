import type { BuildPortResult, BuildResults } from '@/lib/builds/build-results';
import { degText, mmText, signedDegText } from '@/lib/builds/customer-copy';
import { formatDecimal } from '@/lib/format/number-format';

/** The computed results shown beside the measurements they come from (the form's live panel and the record page), in the reader's `locale`. */

export function TdcResult({ tdc, locale }: { tdc: BuildResults['tdc']; locale: string }) {
  if (!tdc) return <p className="text-sm text-steel-500">TDC: enter both stop readings.</p>;
  const side = tdc.tdcReadingSide && tdc.tdcReadingSide !== 'TDC' ? ` ${tdc.tdcReadingSide}` : '';
  return (
    <p className="text-sm" data-testid="tdc-result">
      TDC at <strong className="font-mono">{degText(tdc.tdcReadingDeg, locale)}{side}</strong> on the wheel · correction{' '}
      <strong className="font-mono">{signedDegText(tdc.correctionDeg, locale)}</strong>
      <span className="text-steel-500"> (stops {degText(tdc.stopAngleDeg, locale)} either side)</span>
    </p>
  );
}

export function TimingResult({ results, locale }: { results: Pick<BuildResults, 'timingSetDegBTDC' | 'timingSetMmBTDC' | 'timingNote'>; locale: string }) {
  if (results.timingSetDegBTDC === null && results.timingSetMmBTDC === null) return <p className="text-sm text-steel-500">Timing: not entered.</p>;
  return (
    <p className="text-sm" data-testid="timing-result">
      Timing <strong className="font-mono">{degText(results.timingSetDegBTDC, locale, '° BTDC')}</strong> ={' '}
      <strong className="font-mono">{results.timingSetMmBTDC === null ? '—' : `${mmText(results.timingSetMmBTDC, locale)} BTDC`}</strong>
      {results.timingNote ? <span className="text-steel-500"> · {results.timingNote}</span> : null}
    </p>
  );
}

/** One port's angles, and against its target the deviation with a word for within/outside (not colour alone). */
export function PortResult({ port, toleranceDeg, locale }: { port: BuildPortResult; toleranceDeg: number; locale: string }) {
  if (port.status !== 'opens')
    return <span className="text-xs text-steel-600 dark:text-steel-300">{port.note}</span>;
  return (
    <span className="text-xs" data-testid="port-result">
      <span className="font-mono">
        opens {degText(port.opensDegATDC, locale)} · closes {degText(port.closesDegATDC, locale)} · {degText(port.durationDeg, locale)}
      </span>
      {port.deviationDeg !== undefined ? (
        <span className={port.withinTolerance ? 'text-gauge-700 dark:text-gauge-500' : 'font-semibold text-red-700 dark:text-red-400'}>
          {' '}
          · target {degText(port.targetDurationDeg, locale)} · {signedDegText(port.deviationDeg, locale)} {port.withinTolerance ? 'within' : 'outside'} ±{formatDecimal(toleranceDeg, locale, { maxPlaces: 1 })}°
        </span>
      ) : (
        <span className="text-steel-500"> · no target</span>
      )}
    </span>
  );
}

export function BlowdownResult({ results, locale }: { results: Pick<BuildResults, 'blowdownDeg' | 'blowdownNote'>; locale: string }) {
  if (results.blowdownDeg === null) return results.blowdownNote ? <p className="text-xs text-steel-500">{results.blowdownNote}</p> : null;
  return (
    <p className="text-sm">
      Blowdown <strong className="font-mono">{degText(results.blowdownDeg, locale)}</strong> <span className="text-steel-500">· {results.blowdownNote}</span>
    </p>
  );
}

export function ToleranceNote({ toleranceDeg, locale }: { toleranceDeg: number; locale: string }) {
  return (
    <p className="text-xs text-steel-500">
      Deviation = measured duration − target duration. Within means no more than ±{formatDecimal(toleranceDeg, locale, { maxPlaces: 1 })}° (this workspace’s tolerance; ±2° is common practice).
    </p>
  );
}
