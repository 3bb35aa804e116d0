import type { Metadata } from 'next';
import Link from 'next/link';
import { CheckSheetDownload } from '@/components/printer-check/check-sheet-download';
import { PrinterProfileForm } from '@/components/printer-check/printer-profile-form';
import { ProfileList } from '@/components/printer-check/profile-list';
import { signedInMember } from '@/app/lib/signed-in-member';
import { SignedInWorkspaceProfiles } from '@/components/printer-check/signed-in-workspace-profiles';

export const metadata: Metadata = { title: 'Printer check' };

function Step({ number, title, children }: { number: number; title: string; children: React.ReactNode }) {
  return (
    <section aria-labelledby={`step-${number}`} className="rounded-lg border border-steel-200 bg-white/70 p-5 dark:border-steel-800 dark:bg-steel-900/60">
      <h2 id={`step-${number}`} className="mb-3 flex items-baseline gap-3 text-base font-semibold text-steel-900 dark:text-steel-100">
        <span className="font-mono text-sm text-gauge-600">{String(number).padStart(2, '0')}</span>
        {title}
      </h2>
      <div className="space-y-3 text-sm text-steel-700 dark:text-steel-300">{children}</div>
    </section>
  );
}

/** Measure what the printer does to 100 mm and keep the correction in this browser. */
export default async function PrinterCheckPage() {
  const member = await signedInMember();
  return (
    <div className="mx-auto max-w-3xl space-y-5">
      <header className="space-y-2">
        <h1 className="text-2xl font-bold tracking-tight text-steel-900 dark:text-steel-50">Printer check</h1>
        <p className="text-steel-600 dark:text-steel-300">
          Many printers print a fraction of a percent large or small, and often differently across and down the page. Measure it once;
          the sheet maker then pre-scales every sheet so the marks land where they should.
        </p>
      </header>
      <Step number={1} title="Download the scale check sheet">
        <p>Choose the paper you will print timing sheets on.</p>
        <CheckSheetDownload />
      </Step>
      <Step number={2} title="Print it at actual size">
        <p>
          In the print dialog choose <strong>100 %</strong> / <strong>actual size</strong> and turn off <strong>fit to page</strong> (or
          “shrink oversized pages”). Use the same printer, tray and paper as for your sheets.
        </p>
      </Step>
      <Step number={3} title="Measure both 100 mm bars and enter the lengths">
        <p>
          Lay a steel rule along the horizontal bar, then the vertical one, and read each to the nearest 0.5 mm or better. The card
          outline should match a bank card (85.60 × 53.98 mm, ISO/IEC 7810 ID-1) as a quick cross-check.
        </p>
        <PrinterProfileForm />
      </Step>
      <Step number={4} title="Saved profiles">
        <p>
          Kept in this browser only. The <Link href="/" className="text-gauge-600 underline underline-offset-2">sheet maker</Link> offers
          them beside its download buttons and prints the profile’s name in the title block.
        </p>
        <ProfileList />
      </Step>
      <SignedInWorkspaceProfiles workspaces={member?.workspaces ?? null} />
    </div>
  );
}
