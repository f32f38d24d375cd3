/**
 * Server actions' one wrapper, the counterpart of `withAuth` for routes (lib/api.ts):
 *   export async function updateSettingsAction(input: unknown) {
 *     return runAction({ caller: () => requirePermission(…), input: settingsSchema, raw: input, failed: '…' }, async (member, change) => '…saved.');
 *   }
 * The caller is checked first, then the input is parsed by its zod schema (invalid → the field
 * messages), and every failure becomes words the form can show: an AppError's message, the
 * database's outage, the auth library's own message, or the action's `failed` sentence for
 * anything unexpected (whose details go to the server log only, through toErrorBody).
 * Exported actions stay `async function`s in their 'use server' files and call this.
 */
import 'server-only';
import type { z } from 'zod';
import { AppError, toErrorBody } from './errors';

export type ActionResult = { ok: true; message: string } | { ok: false; message: string; fields?: Record<string, string[]> };

interface ActionSpec<C, S extends z.ZodType> {
  /** Who may act: returns the caller or throws an AppError (unauthorised, forbidden). */
  caller: () => Promise<C>;
  input: S;
  raw: unknown;
  /** Said when the input does not parse; "Some fields are not valid." unless given. */
  invalid?: string;
  /** Said when something unexpected failed. */
  failed: string;
}

export async function runAction<C, S extends z.ZodType>(
  spec: ActionSpec<C, S>,
  work: (caller: C, input: z.output<S>) => Promise<string>,
): Promise<ActionResult> {
  try {
    const caller = await spec.caller();
    const parsed = spec.input.safeParse(spec.raw);
    if (!parsed.success)
      return { ok: false, message: spec.invalid ?? 'Some fields are not valid.', fields: parsed.error.flatten().fieldErrors as Record<string, string[]> };
    return { ok: true, message: await work(caller, parsed.data) };
  } catch (error) {
    // The auth library's errors carry a message written for users.
    const said = (error as { body?: { message?: unknown } } | null)?.body?.message;
    if (!(error instanceof AppError) && typeof said === 'string' && said) return { ok: false, message: said };
    const { status, body } = toErrorBody(error);
    return { ok: false, message: status === 500 ? spec.failed : body.error.message };
  }
}
