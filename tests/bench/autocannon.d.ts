/** autocannon ships no types; this is the part of its documented API the benchmarks use. */
declare module 'autocannon' {
  import type { EventEmitter } from 'node:events';

  interface Request {
    method?: 'GET' | 'POST' | 'PUT' | 'DELETE';
    path: string;
    headers?: Record<string, string>;
    body?: string;
  }
  interface Options {
    url: string;
    connections?: number;
    /** Seconds. */
    duration?: number;
    timeout?: number;
    requests?: Request[];
    headers?: Record<string, string>;
  }
  interface Result {
    errors: number;
    timeouts: number;
    non2xx: number;
    /** Seconds. */
    duration: number;
    totalCompletedRequests: number;
  }
  interface Instance extends EventEmitter {
    stop(): void;
  }
  function autocannon(options: Options, done: (error: Error | null, result: Result) => void): Instance;
  export default autocannon;
}
