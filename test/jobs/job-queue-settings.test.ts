import { describe, expect, it } from "vitest";
import { jobQueueSettings } from "../../lib/jobs/job-queue-settings";

describe("jobQueueSettings", () => {
  it("reassesses inline with one in-process worker when nothing is set", () => {
    expect(jobQueueSettings({})).toEqual({ enqueue: false, inProcessWorkers: 1 });
  });

  it("reads FOULCAST_QUEUE=on and FOULCAST_WORKERS=0 (separate workers)", () => {
    expect(jobQueueSettings({ FOULCAST_QUEUE: "on", FOULCAST_WORKERS: "0" })).toEqual({ enqueue: true, inProcessWorkers: 0 });
  });

  it("refuses values it cannot read, naming the variable", () => {
    expect(() => jobQueueSettings({ FOULCAST_QUEUE: "maybe" })).toThrow('FOULCAST_QUEUE must be "on" or "off", got "maybe"');
    expect(() => jobQueueSettings({ FOULCAST_WORKERS: "-1" })).toThrow('FOULCAST_WORKERS must be a whole number from 0 to 32, got "-1"');
    expect(() => jobQueueSettings({ FOULCAST_WORKERS: "33" })).toThrow("FOULCAST_WORKERS must be a whole number from 0 to 32");
  });
});
