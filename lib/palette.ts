/**
 * Leeway's colours, defined once: the Tailwind theme (tailwind.config.ts) is built from this
 * object, and charts, the lattice and the board pack (SVG and PDF, which classes cannot reach)
 * read the same values. A calm ink-and-paper base, one tide-teal action colour, and signal
 * colours that never carry meaning alone (labels always accompany them).
 */
export const palette = {
  ink: { DEFAULT: '#16232d', soft: '#3c4b57', muted: '#5c6973' },
  paper: { DEFAULT: '#f6f4ef', raised: '#ffffff', sunk: '#ece8df' },
  line: { DEFAULT: '#d9d3c7', strong: '#b9b1a2' },
  tide: { 50: '#e9f4f4', 100: '#cfe7e8', 300: '#7fbcc0', 500: '#23727a', 600: '#1c5f66', 700: '#164c52' },
  ember: { 100: '#f7e3d6', 500: '#b9622f', 700: '#8a4520' },
  moss: { 100: '#dcebdc', 500: '#3f7a4b', 700: '#2d5a36' },
  brick: { 100: '#f5dcd6', 500: '#ad3f2b', 700: '#83301f' },
} as const;

/** One colour per right or decision, in order: strong for lines and marks, light for fills. */
export const seriesStrong = [palette.tide[500], palette.ember[500], palette.moss[500], palette.brick[500], '#5b4a8a', '#8a7a20'];
export const seriesFill = [palette.tide[100], palette.ember[100], palette.moss[100], palette.brick[100], '#e6e0f2', '#f2ecc9'];
