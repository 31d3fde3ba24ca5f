'use client';

export default function GlobalError({ reset }: { error: Error; reset: () => void }) {
  return (
    <html lang="en">
      <body style={{ fontFamily: 'system-ui, sans-serif', background: '#f7f5f0', color: '#1f2a30', padding: '3rem 1.25rem' }}>
        <h1>Waygrade is not available right now.</h1>
        <p>Nothing you saved before has been lost. Please try again in a moment.</p>
        <button onClick={() => reset()} style={{ minHeight: 44, padding: '0 1.25rem' }}>
          Try again
        </button>
      </body>
    </html>
  );
}
