import type { Config } from 'tailwindcss';

/** Rfolio's identity: a silica plate's off-white, the solvent front's teal, the target spot's amber. */
export default {
  content: ['./index.html', './src/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        plate: '#F6F5F0',
        surface: '#FFFFFF',
        line: '#DAD7CE',
        ink: { DEFAULT: '#22252A', soft: '#5B5F66' },
        front: { DEFAULT: '#0F6E6E', dark: '#0B5656', light: '#E3F1F0' },
        spot: { DEFAULT: '#C77D14', dark: '#8F5A0E', light: '#FBF0DE' },
        clean: '#2F7D4A',
        partial: '#9A5F0C',
        failed: '#B3412E',
      },
      fontFamily: {
        sans: ['"IBM Plex Sans"', 'system-ui', 'sans-serif'],
        mono: ['"IBM Plex Mono"', 'ui-monospace', 'monospace'],
      },
      fontSize: {
        '2xs': ['0.6875rem', { lineHeight: '1rem' }],
      },
      borderRadius: { plate: '3px' },
    },
  },
} satisfies Config;
