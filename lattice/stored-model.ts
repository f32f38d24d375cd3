/**
 * A model or a list of rights stored by any engine version, read in today's shape. Until
 * leeway-lattice 4.0.0 a right named its kind under `type` (windows and every other record
 * used `kind`), and the right to pause and restart was `switch`, the engine's own word for a
 * move between modes. Snapshots, runs and cross-checks keep the JSON they were written with
 * (append-only), so every read of a stored model goes through here; the engine's input takes
 * today's shape only.
 */
import type { OptionTemplate, ProjectModel } from './schema';

/**
 * An unnamed right's id comes from its kind (`templateIds`), so an unnamed `switch` keeps the id
 * it was stored and decided under (`switch-n`, n counting the list's switches) instead of
 * becoming `mothball-n`.
 */
export function readStoredTemplates(stored: unknown): OptionTemplate[] {
  if (!Array.isArray(stored)) return [];
  let switches = 0;
  return stored.map((template: unknown) => {
    if (!template || typeof template !== 'object' || 'kind' in template || !('type' in template)) return template as OptionTemplate;
    const { type, ...rest } = template as Record<string, unknown>;
    if (type !== 'switch') return { kind: type, ...rest } as OptionTemplate;
    switches += 1;
    return { kind: 'mothball', ...rest, id: rest.id ?? `switch-${switches}` } as OptionTemplate;
  });
}

export function readStoredModel(stored: unknown): ProjectModel {
  const model = stored as ProjectModel;
  return model && Array.isArray(model.options) ? { ...model, options: readStoredTemplates(model.options) } : model;
}
