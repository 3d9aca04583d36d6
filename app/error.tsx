"use client";

import Link from "next/link";
import { useEffect } from "react";

/** The page failed on the server or in the browser: say so plainly, offer a retry and a way back. */
export default function ErrorPage({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  useEffect(() => {
    console.error(error);
  }, [error]);
  return (
    <section className="error-page" role="alert" aria-labelledby="error-heading">
      <h1 id="error-heading">This page could not be shown</h1>
      <p>Something went wrong while preparing it. Nothing you entered was lost by this error; a change you just submitted may or may not have been saved, so check before repeating it.</p>
      {error.digest ? <p className="subtle">Reference for the server log: <code>{error.digest}</code></p> : null}
      <p className="actions">
        <button type="button" className="primary" onClick={() => reset()}>Try again</button>
        <Link href="/">Back to the fleet</Link>
      </p>
    </section>
  );
}
