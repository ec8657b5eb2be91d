/** The part of autocannon's programmatic API the web benchmark uses (the package ships no types). */
declare module 'autocannon' {
  interface Histogram { average: number; mean: number; p50: number; p90: number; p97_5: number; p99: number; max: number; min: number; total: number }
  interface Result { requests: Histogram; latency: Histogram; throughput: Histogram; errors: number; timeouts: number; non2xx: number; '2xx': number; duration: number }
  interface Options {
    url: string;
    connections?: number;
    duration?: number;
    amount?: number;
    workers?: number;
    /** Requests per second over all connections (0: as fast as the server answers). */
    overallRate?: number;
    headers?: Record<string, string>;
    requests?: { method?: string; path?: string; headers?: Record<string, string> }[];
  }
  function autocannon(opts: Options): Promise<Result> & { stop?: () => void };
  export default autocannon;
}
