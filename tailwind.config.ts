import type { Config } from 'tailwindcss';

// Loaded from app/globals.css with `@config`. The app palette: components use these tokens in classes, never hex values
// (SVG and script colours live in components/charts/theme.ts, the same values).
const config: Config = {
  content: ['./app/**/*.{ts,tsx}', './components/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        paper: '#F6F4EF',
        ink: { DEFAULT: '#18202A', soft: '#3B4654', muted: '#4B5563', faint: '#5B6573', quiet: '#6B7280' },
        mains: { DEFAULT: '#0F766E', dark: '#0B5E58', pale: '#7AA8A3' },
        sub: '#B45309',
        target: '#64748B',
        warn: { DEFAULT: '#B45309', strong: '#92400E' },
        fail: { DEFAULT: '#B91C1C', dark: '#951717' },
        ok: '#166534',
        line: '#D9D4C7',
        // Pale grounds: `wash` behind hovered buttons, `shade` behind table heads, `muted` in disabled fields; `edge` outlines.
        wash: { DEFAULT: '#EFECE4', strong: '#E4DFD3' },
        shade: '#FAF9F5',
        muted: '#F1EFE9',
        edge: '#D6D3CB',
        // Notices and status pills: a tint for the ground, a darker ink for the text, an edge for the border.
        tint: { ok: '#EEF8F1', warn: '#FBF3EA', fail: '#FBEDED', info: '#EEF7F6', plain: '#F1F5F9' },
        'tint-ink': { ok: '#14532D', warn: '#6B3206', fail: '#7F1414', plain: '#334155' },
        'tint-edge': { ok: '#B9DCC3', warn: '#E8C9A5', fail: '#E7B4B4', info: '#B8D8D4' },
      },
      fontFamily: {
        sans: ['var(--font-sans)', 'system-ui', 'sans-serif'],
        mono: ['var(--font-mono)', 'ui-monospace', 'monospace'],
      },
    },
  },
};

export default config;
