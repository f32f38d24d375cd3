/**
 * Text a spreadsheet would read as a formula (it starts with =, +, −, @, a tab or a carriage
 * return) is neutralised on export with a leading apostrophe, the usual defence against formula
 * injection (OWASP, "CSV Injection"). Numbers are written as numbers and never touched.
 */
export function safeCell(value: string | number | null | undefined): string | number | null {
  if (typeof value !== 'string') return value ?? null;
  return /^[=+\-@\t\r]/.test(value) ? `'${value}` : value;
}
