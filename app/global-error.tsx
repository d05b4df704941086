"use client";

export default function GlobalError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <html lang="en">
      <body style={{ fontFamily: "sans-serif", padding: "3rem", maxWidth: "36rem" }}>
        <h1>Roostline is having trouble</h1>
        <p>Nothing you saved is lost. Try again in a moment. Reference: {error.digest ?? "none"}</p>
        <button type="button" onClick={reset}>
          Try again
        </button>
      </body>
    </html>
  );
}
