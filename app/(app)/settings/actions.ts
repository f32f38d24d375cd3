'use server';

import { revalidatePath } from 'next/cache';
import { runAction, type ActionResult } from '@/lib/action';
import { requirePermission } from '@/lib/dal';
import { saveSettings } from '@/lib/settings/service';
import { settingsSchema } from '@/lib/validations/settings';

export async function updateSettingsAction(input: unknown): Promise<ActionResult> {
  return runAction(
    { caller: () => requirePermission({ settings: ['update'] }), input: settingsSchema, raw: input, failed: 'Saving did not work. Please try again.' },
    async (member, change) => {
      await saveSettings(member, change);
      revalidatePath('/settings');
      return 'Organisation defaults saved.';
    },
  );
}
