import type { Config } from 'tailwindcss';

/**
 * Airproof theme tokens. Loaded from app/globals.css with `@config`.
 * The palette is our own: a cool slate for chrome, a teal accent for actions,
 * amber for cautions. Pressure colours on drawings use a separate continuous
 * colour-blind-safe ramp (see lib/pressure-ramp when the editor lands).
 */
const config: Config = {
  content: ['./app/**/*.{ts,tsx}', './components/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        ink: { DEFAULT: '#18212b', soft: '#3b4754', faint: '#6b7785' },
        paper: { DEFAULT: '#f6f7f4', raised: '#ffffff', sunk: '#eceee8' },
        rule: '#d5d9d2',
        accent: { DEFAULT: '#0f766e', strong: '#115e59', soft: '#ccebe7' },
        caution: { DEFAULT: '#b45309', soft: '#fdf0dc' },
        danger: { DEFAULT: '#b42318', soft: '#fde8e6' },
      },
      fontFamily: {
        sans: ['"IBM Plex Sans"', 'system-ui', 'sans-serif'],
        mono: ['"JetBrains Mono"', 'ui-monospace', 'monospace'],
      },
    },
  },
};

export default config;
