/**
 * The engine in the browser, as a Web Worker: what-if edits are valued off the page's main
 * thread, so typing stays smooth. Answers `{ id, ok: true, result }` or `{ id, ok: false,
 * issues }` for a refused model, like the server's worker threads (lattice/worker-entry.ts).
 */
import { explainNode, ModelError, valueProject, type NodeRef, type ValueOptions } from '@/lattice';

export type EngineRequest =
  { id: number; kind: 'value'; model: unknown; options?: ValueOptions } | { id: number; kind: 'explain'; model: unknown; ref: NodeRef };

self.onmessage = (event: MessageEvent<EngineRequest>) => {
  const message = event.data;
  try {
    const result = message.kind === 'value' ? valueProject(message.model, message.options) : explainNode(message.model, message.ref);
    self.postMessage({ id: message.id, ok: true, result });
  } catch (error) {
    if (error instanceof ModelError) self.postMessage({ id: message.id, ok: false, issues: error.issues });
    else
      self.postMessage({
        id: message.id,
        ok: false,
        issues: [{ field: 'engine', message: `The engine stopped: ${String((error as Error)?.message ?? error)}` }],
      });
  }
};
