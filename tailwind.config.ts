/**
 * Leeway's visual identity: the colours come from lib/palette.ts (charts and the board pack read
 * the same values), the type scale and spacing are defined here.
 */
import type { Config } from 'tailwindcss';
import { palette } from './lib/palette';

const config: Config = {
  content: ['./app/**/*.{ts,tsx}', './components/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: palette,
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
