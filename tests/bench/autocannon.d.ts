declare module 'autocannon' {
  interface Histogram {
    average: number;
    mean: number;
    p50: number;
    p99: number;
    max: number;
    /** Requests: how many were answered in all. */
    total: number;
  }
  interface Result {
    requests: Histogram;
    latency: Histogram;
    throughput: Histogram;
    errors: number;
    timeouts: number;
    non2xx: number;
    statusCodeStats?: Record<string, { count: number }>;
    '2xx': number;
    '3xx'?: number;
  }
  interface Options {
    url: string;
    connections?: number;
    duration?: number;
    pipelining?: number;
    headers?: Record<string, string>;
    /** Stop after this many requests instead of after `duration`. */
    amount?: number;
  }
  function autocannon(options: Options): Promise<Result>;
  export default autocannon;
}
