/**
 * The codes the server refuses a new password with (lib/auth.ts). Both are the password's
 * problem, not the form's or the link's: the sign-up and reset forms say them under the field.
 * Kept apart from lib/common-passwords.ts so the forms do not ship its 49,000-word list.
 */
export const COMMON_PASSWORD = 'COMMON_PASSWORD';
export const PUBLISHED_PASSWORD = 'PUBLISHED_PASSWORD';

export function isPasswordRefusal(code: string | undefined): boolean {
  return code === COMMON_PASSWORD || code === PUBLISHED_PASSWORD;
}
