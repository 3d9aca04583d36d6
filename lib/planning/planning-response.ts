// Planner errors as JSON answers of the API: 400 for bad input, 404 for what does not exist.
import { z } from "zod";
import { EconomicsInputError } from "../core/economics";
import { PlanInputError } from "../core/plan";
import { PlanningError } from "./load-plan-input";

/** Runs a planner request and turns the planner's own errors into { error } answers; anything else propagates. */
export async function planningResponse(work: () => Promise<Response>): Promise<Response> {
  try {
    return await work();
  } catch (error) {
    if (error instanceof PlanningError) {
      const status = /^unknown |^no plan run|has no plan yet|no site in the database/.test(error.message) ? 404 : 400;
      return Response.json({ error: error.message }, { status });
    }
    if (error instanceof PlanInputError || error instanceof EconomicsInputError) return Response.json({ error: error.message }, { status: 400 });
    if (error instanceof z.ZodError) return Response.json({ error: error.issues.map((issue) => `${issue.path.join(".") || "body"}: ${issue.message}`).join("; ") }, { status: 400 });
    throw error;
  }
}

/** The JSON body of a request, or a PlanningError naming what is wrong with it. */
export async function readJsonBody(request: Request, maximumBytes = 64 * 1024): Promise<unknown> {
  const text = await request.text();
  if (text.length > maximumBytes) throw new PlanningError(`request body is larger than ${maximumBytes} bytes`);
  if (!text.trim()) return {};
  try {
    return JSON.parse(text) as unknown;
  } catch {
    throw new PlanningError("request body is not valid JSON");
  }
}
