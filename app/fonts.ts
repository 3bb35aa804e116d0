import localFont from 'next/font/local';

// Shipped in fonts/ (DejaVu, see fonts/LICENSE-DejaVu.txt); nothing is fetched at build or run time.
export const uiFont = localFont({
  src: [
    { path: '../fonts/DejaVuSans.ttf', weight: '400', style: 'normal' },
    { path: '../fonts/DejaVuSans-Bold.ttf', weight: '700', style: 'normal' },
  ],
  variable: '--font-ui',
  display: 'swap',
});

export const figuresFont = localFont({
  src: [{ path: '../fonts/DejaVuSansMono.ttf', weight: '400', style: 'normal' }],
  variable: '--font-figures',
  display: 'swap',
});
