'use client';

import { useSyncExternalStore } from 'react';

const noChange = () => () => undefined;

/**
 * False in the server's HTML and while React takes the page over, true after. Before then a
 * button does nothing, or worse: a form is sent by the browser itself, as a GET of the page with
 * the fields in its address (a key's name, a password) and what was typed is lost; a plain button
 * (New case, Rename…) ignores the click. So every button waits for it, and looks it.
 */
export function useInteractive(): boolean {
  return useSyncExternalStore(
    noChange,
    () => true,
    () => false,
  );
}
