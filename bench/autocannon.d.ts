/**
 * The few parts of autocannon's API that bench/search.ts uses. Not @types/autocannon: its
 * `/// <reference types="node" />` made tsc type the timers of the whole project as the DOM's
 * (setInterval returning a number).
 */
declare module 'autocannon' {
  namespace autocannon {
    interface Request {
      method?: string;
      path?: string;
      headers?: Record<string, string>;
      body?: string;
      setupRequest?: (req: Request, context: object) => Request;
    }
    interface Options {
      url: string;
      connections?: number;
      duration?: number;
      requests?: Request[];
    }
    interface Histogram {
      average: number;
      total: number;
      p50: number;
      p99: number;
    }
    interface Result {
      requests: Histogram;
      latency: Histogram;
      throughput: Histogram;
      non2xx: number;
      errors: number;
      timeouts: number;
    }
    interface Instance {
      stop(): void;
    }
  }
  function autocannon(opts: autocannon.Options, cb: (err: Error | null, result: autocannon.Result) => void): autocannon.Instance;
  export = autocannon;
}
