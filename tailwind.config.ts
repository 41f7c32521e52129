import type { Config } from 'tailwindcss';

// Loaded from app/globals.css with `@config`; the palette is SPEC §7's.
const config: Config = {
  content: ['./app/**/*.{ts,tsx}', './components/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        paper: '#F6F4EF',
        ink: { DEFAULT: '#18202A', soft: '#3B4654', faint: '#5B6573' },
        mains: '#0F766E',
        sub: '#B45309',
        target: '#64748B',
        warn: '#B45309',
        fail: '#B91C1C',
        ok: '#166534',
        line: '#D9D4C7',
      },
      fontFamily: {
        sans: ['var(--font-sans)', 'system-ui', 'sans-serif'],
        mono: ['var(--font-mono)', 'ui-monospace', 'monospace'],
      },
    },
  },
};

export default config;
