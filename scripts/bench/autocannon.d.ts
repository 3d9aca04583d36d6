// The part of autocannon 9 (no bundled types) the API load benchmark uses.
declare module "autocannon" {
  import type { EventEmitter } from "node:events";

  interface AutocannonOptions {
    url: string;
    connections?: number;
    duration?: number;
    /** Requests to send in all; the run ends when they are answered (overrides duration). */
    amount?: number;
    timeout?: number;
    headers?: Record<string, string>;
  }

  interface AutocannonResult {
    requests: { average: number; total: number };
    latency: { p50: number; p90: number; p99: number; average: number; max: number };
    throughput: { average: number };
    duration: number;
    errors: number;
    timeouts: number;
    non2xx: number;
    "2xx": number;
  }

  type Instance = EventEmitter & PromiseLike<AutocannonResult> & {
    stop(): void;
    on(event: "response", listener: (client: unknown, statusCode: number, resBytes: number, responseTimeMs: number) => void): Instance;
  };

  function autocannon(options: AutocannonOptions): Instance;
  export default autocannon;
}
