'use client';

export default function GlobalError({ reset }: { error: Error; reset: () => void }) {
  return (
    <html lang="en-GB">
      <body style={{ fontFamily: 'system-ui', padding: '4rem', color: '#16232d' }}>
        <h1>Leeway could not load this page</h1>
        <p>Nothing you entered has been lost on the server. Please try again.</p>
        <button onClick={reset}>Try again</button>
      </body>
    </html>
  );
}
