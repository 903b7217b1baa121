declare module 'autocannon' {
  interface Histogram {
    average: number;
    mean: number;
    p50: number;
    p99: number;
    max: number;
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
  }
  function autocannon(options: Options): Promise<Result>;
  export default autocannon;
}
