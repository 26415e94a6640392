// The parts of autocannon 9's API the benchmark uses (the package ships no types; @types/autocannon is not
// installed, see the README's dependency note).
declare module 'autocannon' {
  interface Request {
    method?: string;
    path?: string;
    body?: string;
    headers?: Record<string, string>;
  }
  export interface Options {
    url: string;
    connections?: number;
    duration?: number;
    method?: string;
    headers?: Record<string, string>;
    body?: string;
    requests?: Request[];
  }
  interface Histogram {
    average: number;
    p50: number;
    p99: number;
    max: number;
  }
  export interface Result {
    requests: Histogram;
    latency: Histogram;
    errors: number;
    timeouts: number;
    non2xx: number;
  }
  export default function autocannon(options: Options): Promise<Result>;
}
