/** Shown while a page's data loads (React Suspense boundary of the app router). */
export default function Loading() {
  return (
    <div className="loading" role="status" aria-live="polite">
      <span className="loading-bar" aria-hidden="true" />
      Loading…
    </div>
  );
}
