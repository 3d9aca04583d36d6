// The condition category as a shape plus its text label: readable without colour (shape and words) and with it.
import { FLEET_STATUS_LABELS, type FleetStatus } from "@/lib/planning/fleet-status";

/** Our own shapes: diamond, triangle, ring, disc, dashed square; colours hold ≥ 4.5:1 on white (checked in globals.css notes). */
function Shape({ status }: { status: FleetStatus }) {
  switch (status) {
    case "act-now":
      return <path d="M7 0.5 L13.5 7 L7 13.5 L0.5 7 Z" className="mark-act-now" />;
    case "plan-cleaning":
      return <path d="M7 1 L13.5 13 L0.5 13 Z" className="mark-plan-cleaning" />;
    case "watch":
      return <circle cx="7" cy="7" r="4.8" className="mark-watch" />;
    case "good":
      return <circle cx="7" cy="7" r="5.5" className="mark-good" />;
    case "no-estimate":
      return <rect x="1.5" y="1.5" width="11" height="11" className="mark-no-estimate" />;
  }
}

export function FleetStatusShape({ status }: { status: FleetStatus }) {
  return (
    <svg className="status-shape" width="14" height="14" viewBox="0 0 14 14" aria-hidden="true" focusable="false">
      <Shape status={status} />
    </svg>
  );
}

export function FleetStatusMark({ status }: { status: FleetStatus }) {
  return (
    <span className={`status-mark status-${status}`}>
      <FleetStatusShape status={status} />
      {FLEET_STATUS_LABELS[status]}
    </span>
  );
}
