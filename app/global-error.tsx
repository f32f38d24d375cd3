'use client';

import { palette } from '@/lib/palette';

// Rendered when the root layout itself failed, so without the stylesheet: the palette's ink, inline.
export default function GlobalError({ reset }: { error: Error; reset: () => void }) {
  return (
    <html lang="en-GB">
      <body style={{ fontFamily: 'system-ui', padding: '4rem', color: palette.ink.DEFAULT }}>
        <h1>Leeway could not load this page</h1>
        <p>Nothing you entered has been lost on the server. Please try again.</p>
        <button onClick={reset}>Try again</button>
      </body>
    </html>
  );
}
