// The part of autocannon's programmatic API the throughput benchmark uses (the package ships no types).
declare module 'autocannon' {
  interface Histogram {
    average: number;
    p50: number;
    p99: number;
    max: number;
    total?: number;
  }
  interface Options {
    url: string;
    connections?: number;
    duration?: number;
    method?: string;
    headers?: Record<string, string>;
    body?: string;
  }
  interface Result {
    requests: Histogram;
    latency: Histogram;
    throughput: Histogram;
    duration: number;
    errors: number;
    timeouts: number;
    non2xx: number;
    statusCodeStats: Record<string, { count: number }>;
  }
  function autocannon(options: Options): Promise<Result>;
  export = autocannon;
}
