/**
 * The one error type of the planner for malformed input (not for infeasible plans, which are reported as
 * violations). `field` names the offending input, e.g. "assets[3].lockedWeeks".
 */
export class PlanInputError extends Error {
  readonly field: string;

  constructor(field: string, message: string) {
    super(message);
    this.name = "PlanInputError";
    this.field = field;
  }
}
