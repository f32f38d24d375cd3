/**
 * Leeway's visual identity, defined once: a calm ink-and-paper base, one tide-teal action
 * colour, and signal colours that never carry meaning alone (labels always accompany them).
 */
import type { Config } from 'tailwindcss';

const config: Config = {
  content: ['./app/**/*.{ts,tsx}', './components/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        ink: { DEFAULT: '#16232d', soft: '#3c4b57', muted: '#66737d' },
        paper: { DEFAULT: '#f6f4ef', raised: '#ffffff', sunk: '#ece8df' },
        line: { DEFAULT: '#d9d3c7', strong: '#b9b1a2' },
        tide: { 50: '#e9f4f4', 100: '#cfe7e8', 300: '#7fbcc0', 500: '#23727a', 600: '#1c5f66', 700: '#164c52' },
        ember: { 100: '#f7e3d6', 500: '#b9622f', 700: '#8a4520' },
        moss: { 100: '#dcebdc', 500: '#3f7a4b', 700: '#2d5a36' },
        brick: { 100: '#f5dcd6', 500: '#ad3f2b', 700: '#83301f' },
      },
      fontFamily: {
        sans: ['"Work Sans"', 'system-ui', 'sans-serif'],
      },
      fontSize: {
        // A restrained scale: figures are the content, headings only frame them.
        caption: ['0.75rem', { lineHeight: '1rem' }],
        body: ['0.9375rem', { lineHeight: '1.5rem' }],
        lead: ['1.0625rem', { lineHeight: '1.65rem' }],
        title: ['1.5rem', { lineHeight: '2rem', fontWeight: '600' }],
        display: ['2.125rem', { lineHeight: '2.5rem', fontWeight: '600' }],
      },
      spacing: { gutter: '1.5rem', rail: '15rem' },
      borderRadius: { card: '0.625rem' },
      boxShadow: { card: '0 1px 2px rgba(22,35,45,0.06), 0 1px 1px rgba(22,35,45,0.04)' },
    },
  },
};

export default config;
