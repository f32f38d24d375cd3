import type { ReactNode } from 'react';
import { ENGINE_VERSION } from '@/lattice';

/**
 * Said wherever stored figures are listed and an older engine computed them (docs/engine.md: a
 * list showing figures from an older version says so). Nothing when today's engine did; the
 * children (a re-value button) follow the words.
 */
export function OlderEngineNote({ engineVersion, children }: { engineVersion: string | null | undefined; children?: ReactNode }) {
  if (!engineVersion || engineVersion === ENGINE_VERSION) return null;
  return (
    <span className="block text-caption font-normal text-ember-700">
      computed by {engineVersion}, before today&rsquo;s engine{children}
    </span>
  );
}
