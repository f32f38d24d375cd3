/**
 * Text for the PDF. The embedded Work Sans files cover Latin (with the true minus sign); Greek
 * letters, subscripts and arrows are spelled out so no glyph is ever missing from the page.
 */
const replacements: [RegExp, string][] = [
  [/σ/g, 'sigma'],
  [/δ/g, 'delta'],
  [/Δ/g, 'Delta'],
  [/₀/g, '0'],
  [/→/g, 'to'],
  [/≥/g, '>='],
  [/≤/g, '<='],
  [/×/g, 'x'],
];

export function pdfText(text: string): string {
  return replacements.reduce((s, [pattern, to]) => s.replace(pattern, to), text);
}
