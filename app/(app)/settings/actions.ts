'use server';

import { revalidatePath } from 'next/cache';
import { db } from '@/db';
import { saveSettingsAudited } from '@/db/queries/settings';
import { requirePermission } from '@/lib/dal';
import { AppError } from '@/lib/errors';
import { settingsSchema } from '@/lib/validations/settings';

export type ActionResult = { ok: true; message: string } | { ok: false; message: string; fields?: Record<string, string[]> };

export async function updateSettingsAction(input: unknown): Promise<ActionResult> {
  try {
    const member = await requirePermission({ settings: ['update'] });
    const parsed = settingsSchema.safeParse(input);
    if (!parsed.success) return { ok: false, message: 'Some fields are not valid.', fields: parsed.error.flatten().fieldErrors as Record<string, string[]> };
    await saveSettingsAudited(db, { orgId: member.orgId, userId: member.userId, change: parsed.data });
    revalidatePath('/settings');
    return { ok: true, message: 'Organisation defaults saved.' };
  } catch (error) {
    if (error instanceof AppError) return { ok: false, message: error.message };
    console.error('[leeway] updateSettingsAction', error);
    return { ok: false, message: 'Saving did not work. Please try again.' };
  }
}
