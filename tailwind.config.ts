import type { Config } from 'tailwindcss';

// Rimscale's palette: steel greys with one signal colour (ignition amber) and
// a cool "machined" blue for interactive elements. Sheets are always black on white.
const config: Config = {
  content: ['./app/**/*.{ts,tsx}', './components/**/*.{ts,tsx}'],
  darkMode: 'media',
  theme: {
    extend: {
      colors: {
        steel: {
          50: '#f5f7f8',
          100: '#e8ecee',
          200: '#cfd6da',
          300: '#aab6bd',
          400: '#7d8d96',
          500: '#5e6e78',
          600: '#4a5861',
          700: '#3d4850',
          800: '#2c343a',
          900: '#1c2226',
          950: '#101417',
        },
        spark: {
          400: '#f6b042',
          500: '#e8951c',
          600: '#c67712',
          // Text on light grounds: 4.8:1 on the panel beige, 5.4:1 on white (WCAG 2.x AA asks 4.5:1).
          700: '#9a5a0a',
        },
        gauge: {
          500: '#2f7fa3',
          600: '#246887',
          700: '#1d546d',
        },
      },
      fontFamily: {
        sans: ['var(--font-ui)', 'system-ui', 'sans-serif'],
        mono: ['var(--font-figures)', 'ui-monospace', 'monospace'],
      },
    },
  },
};

export default config;
