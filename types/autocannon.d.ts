// Types for the parts of autocannon 9 (plain JavaScript, no bundled types) that bench/api.bench.ts uses.
declare module "autocannon" {
  import type { EventEmitter } from "node:events";
  interface Options {
    url: string;
    connections?: number;
    duration?: number;
    headers?: Record<string, string>;
    requests?: Record<string, unknown>[];
  }
  interface Instance extends EventEmitter, PromiseLike<unknown> {
    on(event: "response", listener: (client: unknown, statusCode: number, resBytes: number, responseTime: number) => void): this;
  }
  function autocannon(opts: Options): Instance;
  export default autocannon;
}
