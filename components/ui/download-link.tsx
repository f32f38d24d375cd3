'use client';

import { useState, type MouseEvent, type ReactNode } from 'react';
import { ApiError, getFile } from '@/lib/api-client';

/**
 * A link to a file the server makes when asked: a PDF it renders, a workbook it writes. Pressed,
 * the page fetches the file itself, so it can say the file is being prepared (a report takes
 * seconds) and, when the server refuses (busy, not allowed, gone), say why beside the link,
 * instead of leaving the browser on a page of JSON. Opened in a new tab or window, or pressed
 * before the page's script has loaded, it is a plain link to the same address.
 */
export function DownloadLink({
  href,
  className,
  title,
  label,
  children,
}: {
  href: string;
  className?: string;
  title?: string;
  /** The link's accessible name, when its text alone does not say which file. */
  label?: string;
  children: ReactNode;
}) {
  const [busy, setBusy] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const download = async (event: MouseEvent<HTMLAnchorElement>) => {
    if (event.button !== 0 || event.metaKey || event.ctrlKey || event.shiftKey || event.altKey) return;
    event.preventDefault();
    if (busy) return;
    setBusy(true);
    setProblem(null);
    try {
      const { blob, filename } = await getFile(href);
      const url = URL.createObjectURL(blob);
      const save = document.createElement('a');
      save.href = url;
      save.download = filename ?? '';
      document.body.append(save);
      save.click();
      save.remove();
      // The browser has taken the file by now; its address is kept a while for slow browsers.
      setTimeout(() => URL.revokeObjectURL(url), 60_000);
    } catch (error) {
      setProblem(error instanceof ApiError ? error.message : 'The file did not arrive; check the connection and try again.');
    } finally {
      setBusy(false);
    }
  };
  return (
    <span className="inline-flex flex-col items-start gap-1">
      <a href={href} className={className} title={title} aria-label={label} aria-busy={busy || undefined} onClick={(event) => void download(event)}>
        {children}
      </a>
      <span role="status" aria-live="polite" className="text-caption text-ink-muted">
        {busy ? 'Preparing the file…' : ''}
      </span>
      {problem ? (
        <span role="alert" className="max-w-xs text-caption text-brick-700">
          {problem}
        </span>
      ) : null}
    </span>
  );
}
