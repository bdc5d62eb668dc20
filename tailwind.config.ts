import type { Config } from 'tailwindcss';

/**
 * Duskhaul's own palette: deep blue-grey surfaces of a late-evening sky, warm amber for what the
 * user can act on, and quiet status tones. Pairs used for text meet WCAG AA on the dusk surfaces.
 */
export default {
  content: ['./index.html', './src/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        dusk: {
          50: '#f3f6fa',
          100: '#e6ebf2',
          200: '#cdd5e0',
          300: '#a9b5c6',
          400: '#8391a6',
          500: '#5b6b82',
          600: '#3d4d63',
          700: '#2c3a4e',
          800: '#1f2a3a',
          850: '#192331',
          900: '#141d29',
          950: '#0d131c',
        },
        ember: {
          200: '#fbe0b0',
          300: '#f6c77a',
          400: '#f2b451',
          500: '#e89a2c',
          600: '#c97d17',
          900: '#2a1b05',
        },
        sage: { 300: '#a6dcb9', 400: '#8fd3a8', 900: '#12281b' },
        rosehip: { 300: '#f7aaa3', 400: '#f28b82', 900: '#2e1412' },
      },
      fontFamily: {
        sans: ['"IBM Plex Sans"', 'system-ui', 'sans-serif'],
      },
    },
  },
} satisfies Config;
