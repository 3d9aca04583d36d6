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
    if (error instanceof BodyTooLarge) return Response.json({ error: error.message }, { status: 413 });
    if (error instanceof PlanningError) {
      const status = /^unknown |^no plan run|has no plan yet|no site in the database/.test(error.message) ? 404 : 400;
      return Response.json({ error: error.message }, { status });
    }
    if (error instanceof PlanInputError || error instanceof EconomicsInputError) return Response.json({ error: error.message }, { status: 400 });
    if (error instanceof z.ZodError) return Response.json({ error: error.issues.map((issue) => `${issue.path.join(".") || "body"}: ${issue.message}`).join("; ") }, { status: 400 });
    throw error;
  }
}

/** A body over the limit: answered 413 by planningResponse. */
export class BodyTooLarge extends PlanningError {}

/**
 * The JSON body of a request, or a PlanningError naming what is wrong with it. The body is read as a stream and
 * refused as soon as it passes `maximumBytes` (or at once when Content-Length says so), never buffered whole.
 */
export async function readJsonBody(request: Request, maximumBytes = 64 * 1024): Promise<unknown> {
  const declared = Number(request.headers.get("content-length") ?? NaN);
  if (Number.isFinite(declared) && declared > maximumBytes) throw new BodyTooLarge(`request body is larger than ${maximumBytes} bytes`);
  const chunks: Uint8Array[] = [];
  let size = 0;
  if (request.body) {
    const reader = request.body.getReader();
    for (;;) {
      const { done, value } = await reader.read();
      if (done) break;
      size += value.byteLength;
      if (size > maximumBytes) {
        await reader.cancel();
        throw new BodyTooLarge(`request body is larger than ${maximumBytes} bytes`);
      }
      chunks.push(value);
    }
  }
  const text = Buffer.concat(chunks).toString("utf8");
  if (!text.trim()) return {};
  try {
    return JSON.parse(text) as unknown;
  } catch {
    throw new PlanningError("request body is not valid JSON");
  }
}
