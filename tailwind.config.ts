import type { Config } from 'tailwindcss';

// Pourproof's theme. The stage grey is sRGB #777777, about CIELAB L* 50 (D65):
// colour is judged against a neutral surround, so nothing saturated sits near it.
const config: Config = {
  content: ['./app/**/*.{ts,tsx}', './components/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        stage: { DEFAULT: '#777777', rule: '#d9d9d9' },
        panel: { DEFAULT: '#f4f1ec', deep: '#e8e3db', line: '#d6cfc4' },
        ink: { DEFAULT: '#22201c', soft: '#5b5750' },
        accent: { DEFAULT: '#1f5f8b', strong: '#174a6d', soft: '#dbe8f1' },
        band: { ok: '#2f6b3a', close: '#5a6b2f', warn: '#8a5a12', off: '#8b2e24' },
      },
      fontFamily: {
        sans: ['"IBM Plex Sans"', 'system-ui', 'sans-serif'],
        mono: ['"IBM Plex Mono"', 'ui-monospace', 'monospace'],
      },
      minHeight: { tap: '44px' },
      minWidth: { tap: '44px' },
    },
  },
  plugins: [],
};

export default config;
