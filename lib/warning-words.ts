/**
 * An engine warning as a sentence, as Results, the board pack and the validation report print
 * it: the engine writes them lower-case and unpunctuated, for logs and the API alike.
 */
export function warningSentence(warning: string): string {
  return `${warning.charAt(0).toUpperCase()}${warning.slice(1)}.`;
}
