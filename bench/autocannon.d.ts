/** The parts of autocannon 9 (no bundled types) that bench/server.ts uses. */
declare module 'autocannon' {
  namespace autocannon {
    interface Request {
      method?: string;
      path?: string;
      headers?: Record<string, string>;
      body?: string;
      setupRequest?: (request: Request) => Request;
    }
    interface Options {
      url: string;
      connections?: number;
      duration?: number;
      requests?: Request[];
    }
    interface Histogram {
      average: number;
      p50: number;
      p90: number;
      p99: number;
      max: number;
      total: number;
    }
    interface Result {
      latency: Histogram;
      requests: Histogram;
      errors: number;
      timeouts: number;
      non2xx: number;
    }
  }
  function autocannon(options: autocannon.Options): Promise<autocannon.Result>;
  export = autocannon;
}
