import type { Config } from 'tailwindcss';

// Rungbook's own palette: a warm paper ground, deep ink, a verdigris accent for actions, brine blue
// for information and ember for cautions. Energy directions are never told by colour alone.
const config: Config = {
  content: ['./app/**/*.{ts,tsx}', './components/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        paper: { DEFAULT: '#f7f5f0', deep: '#ece8df' },
        ink: { DEFAULT: '#1e2b33', soft: '#4a5a63', faint: '#7b8a92' },
        verdigris: { 50: '#eef7f5', 100: '#d5ece7', 500: '#2f7d71', 600: '#256a60', 700: '#1d554d' },
        brine: { 50: '#eef4fa', 500: '#3b6b95', 700: '#2a4f70' },
        ember: { 50: '#fdf1eb', 500: '#b5532a', 700: '#8a3c1c' },
        rule: '#d8d2c6',
      },
      fontFamily: { sans: ['var(--font-body)', 'system-ui', 'sans-serif'] },
      minHeight: { touch: '44px' },
      minWidth: { touch: '44px' },
    },
  },
};

export default config;
