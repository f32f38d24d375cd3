/**
 * Passwords everyone tries first are refused (OWASP ASVS 2.1.7; NIST SP 800-63B §5.1.1.2: check
 * new passwords against a list of commonly used ones). The list is the ~49,000 passwords of
 * @zxcvbn-ts/language-common, shipped with the app: no network call.
 */
import { dictionary } from '@zxcvbn-ts/language-common';

let common: Set<string> | undefined;

export function isCommonPassword(password: string): boolean {
  common ??= new Set((dictionary['passwords-common'] as string[]).map((p) => p.toLowerCase()));
  return common.has(password.trim().toLowerCase());
}

export const COMMON_PASSWORD_MESSAGE = 'This password is one of the most common ones; choose one that is harder to guess.';
