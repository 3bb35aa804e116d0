import type { Metadata, Viewport } from 'next';
import { signedInMember } from '@/app/lib/signed-in-member';
import { AccountMenu } from '@/components/account/account-menu';
import { SiteHeader } from '@/components/shell/site-header';
import { figuresFont, uiFont } from './fonts';
import './globals.css';

export const metadata: Metadata = {
  title: { default: 'Rimscale — true-scale degree wheels and timing strips', template: '%s · Rimscale' },
  description:
    'Print true-scale degree wheels, flange rings and rim timing strips for small two-stroke engines, and keep a shop’s engine templates and build records.',
  // Files in public/, drawn by scripts/make-icons.mjs from public/icon.svg.
  manifest: '/manifest.webmanifest',
  icons: {
    icon: [
      { url: '/favicon.ico', sizes: '32x32' },
      { url: '/icon.svg', type: 'image/svg+xml' },
    ],
    apple: '/apple-touch-icon.png',
  },
};

export const viewport: Viewport = { themeColor: '#1c2226', width: 'device-width', initialScale: 1 };

export default async function RootLayout({ children }: { children: React.ReactNode }) {
  const member = await signedInMember();
  return (
    <html lang="en" className={`${uiFont.variable} ${figuresFont.variable}`}>
      <body className="min-h-screen font-sans antialiased">
        <SiteHeader>
          <AccountMenu member={member} />
        </SiteHeader>
        <main className="mx-auto max-w-7xl px-4 py-6">{children}</main>
        <footer className="mx-auto max-w-7xl px-4 py-8 text-xs text-steel-500">
          Rimscale sheets are aids, not specifications: the engine maker’s manual and local regulations come first.
        </footer>
      </body>
    </html>
  );
}
