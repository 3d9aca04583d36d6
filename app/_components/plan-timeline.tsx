import type { PlanDocument } from "@/lib/planning/plan-document";

/**
 * The plan as a week-by-week timeline: one row per exchanger with its cleanings (booked solid, proposed outlined)
 * and its P10 threshold week (a bar), turnaround and blackout weeks shaded behind, and the crew load per week under
 * it. Server-rendered; every bar links to its row in the cleanings table.
 */
export function PlanTimeline({ plan }: { plan: PlanDocument }) {
  const weeks = plan.horizon.weeks;
  const left = (week: number) => `${(week / weeks) * 100}%`;
  const width = (span: number) => `${(span / weeks) * 100}%`;
  const rows = plan.assets
    .map((asset) => ({ asset, cleanings: plan.cleanings.filter((cleaning) => cleaning.tag === asset.tag) }))
    .sort((a, b) => (a.cleanings[0]?.week ?? weeks) - (b.cleanings[0]?.week ?? weeks) || a.asset.tag.localeCompare(b.asset.tag));
  const months = plan.weeks.filter((week, index) => index === 0 || week.start.slice(5, 7) !== plan.weeks[index - 1]?.start.slice(5, 7));
  return (
    <div className="timeline" role="figure" aria-label={`Cleaning timeline, ${weeks} weeks from ${plan.horizon.start}`}>
      <div className="timeline-row timeline-scale" aria-hidden="true">
        <span className="timeline-label">Week of</span>
        <span className="timeline-track">
          {months.map((week) => (
            <span key={week.index} className="timeline-month" style={{ left: left(week.index) }}>{week.start.slice(0, 7)}</span>
          ))}
        </span>
      </div>
      <div className="timeline-body">
        <span className="timeline-shading" aria-hidden="true">
          {plan.weeks.map((week) =>
            week.blackout || week.turnaround ? (
              <span key={week.index} className={week.blackout ? "shade-blackout" : "shade-turnaround"} style={{ left: left(week.index), width: width(1) }} title={week.blackout ? `Blackout, week of ${week.start}` : `${week.turnaround}, week of ${week.start}`} />
            ) : null,
          )}
        </span>
        {rows.map(({ asset, cleanings }) => (
          <div className="timeline-row" key={asset.tag}>
            <span className="timeline-label">{asset.tag}</span>
            <span className="timeline-track">
              {asset.deadlineWeek !== null && asset.deadlineWeek < weeks ? (
                <span className="deadline-mark" style={{ left: left(asset.deadlineWeek + 1) }} title={`${asset.tag}: latest start at the ${plan.settings.deadlineQuantile.toUpperCase()} threshold date, week of ${plan.weeks[asset.deadlineWeek]?.start}`} />
              ) : null}
              {cleanings.map((cleaning) => (
                <a
                  key={cleaning.start}
                  href={`#clean-${cleaning.tag}-${cleaning.start}`}
                  className={`bar bar-${cleaning.state}`}
                  style={{ left: left(cleaning.week), width: width(Math.max(1, Math.ceil(cleaning.outageDays / 7))) }}
                  title={`${cleaning.tag}: ${cleaning.state} cleaning from ${cleaning.start}, back ${cleaning.returnToService} (${cleaning.window})`}
                >
                  <span className="visually-hidden">{`${cleaning.tag} ${cleaning.state} ${cleaning.start}`}</span>
                </a>
              ))}
            </span>
          </div>
        ))}
      </div>
      <div className="timeline-row timeline-load">
        <span className="timeline-label">Crews in use</span>
        <span className="timeline-track">
          {plan.weeks.map((week) => (
            <span
              key={week.index}
              className={`load-cell${week.crewLoad >= week.crewCapacity && week.crewCapacity > 0 ? " load-full" : ""}`}
              style={{ left: left(week.index), width: width(1) }}
              title={`Week of ${week.start}: ${week.crewLoad} of ${week.crewCapacity} crews${week.out.length ? ` (${week.out.join(", ")})` : ""}`}
            >
              {week.crewLoad > 0 ? week.crewLoad : ""}
            </span>
          ))}
        </span>
      </div>
      <p className="legend">
        <span className="bar-swatch bar-booked" /> booked <span className="bar-swatch bar-proposed" /> proposed <span className="bar-swatch shade-turnaround" /> turnaround
        <span className="bar-swatch shade-blackout" /> blackout <span className="deadline-swatch" /> latest start at the {plan.settings.deadlineQuantile.toUpperCase()} threshold date · crews per week: {plan.settings.crewCapacity}
      </p>
    </div>
  );
}
