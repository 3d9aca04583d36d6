/** The standing caution shown wherever Foulcast speaks of cleaning work. */
export function AdvisoryCaution() {
  return (
    <aside className="caution" role="note" aria-label="Safety and advisory notice">
      <strong>Advisory only.</strong> Foulcast estimates exchanger condition and proposes dates from operating data;
      it does not authorise work. Cleaning means isolating, draining and opening equipment that may be under pressure,
      hot, or hold hazardous fluids: site procedures, permits to work, local codes and licensed engineering practice
      govern every decision and every job.
    </aside>
  );
}
