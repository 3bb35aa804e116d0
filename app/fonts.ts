import localFont from 'next/font/local';

// WOFF2 subsets of DejaVu (fonts/LICENSE-DejaVu.txt) made by scripts/make-web-fonts.mjs: Latin-1, the signs the
// pages show (° − → ± ✓) and every character in the UI's source. The whole TTFs in fonts/ are for the PDFs only.
export const uiFont = localFont({
  src: [
    { path: '../fonts/web/DejaVuSans-web.woff2', weight: '400', style: 'normal' },
    { path: '../fonts/web/DejaVuSans-Bold-web.woff2', weight: '700', style: 'normal' },
  ],
  variable: '--font-ui',
  display: 'swap',
});

export const figuresFont = localFont({
  src: [{ path: '../fonts/web/DejaVuSansMono-web.woff2', weight: '400', style: 'normal' }],
  variable: '--font-figures',
  display: 'swap',
});
