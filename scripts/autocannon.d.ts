// The few parts of autocannon's API that scripts/bench.ts uses (it ships no types).
declare module "autocannon" {
  namespace autocannon {
    type Options = { url: string; method?: string; headers?: Record<string, string>; body?: string; connections?: number; duration?: number };
    type Histogram = { average: number; p50: number; p99: number; total: number };
    type Result = { requests: Histogram; latency: Histogram; throughput: Histogram; errors: number; timeouts: number; non2xx: number; "2xx": number; "3xx": number; "4xx": number; "5xx": number };
  }
  function autocannon(opts: autocannon.Options, cb: (err: Error | null, res: autocannon.Result) => void): unknown;
  export default autocannon;
}
