/** The asset page reads the assessment and rates every day for the charts: show a placeholder meanwhile. */
export default function AssetLoading() {
  return (
    <div className="loading" role="status" aria-live="polite">
      <span className="loading-bar" aria-hidden="true" />
      Loading the exchanger and its analysis…
    </div>
  );
}
