// The part of autocannon's API the listing benchmark uses (the package ships no types).
declare module 'autocannon' {
  interface Histogram {
    average: number;
    p50: number;
    p97_5: number;
  }
  interface Result {
    requests: Histogram;
    latency: Histogram;
    errors: number;
    timeouts: number;
    non2xx: number;
  }
  interface RequestParams {
    method?: string;
    path?: string;
    headers?: Record<string, string>;
  }
  interface Options {
    url: string;
    connections?: number;
    duration?: number;
    requests?: Array<RequestParams & { setupRequest?: (req: RequestParams) => RequestParams }>;
  }
  interface Instance extends Promise<Result> {
    on(
      event: 'response',
      listener: (client: unknown, status: number, bytes: number, ms: number) => void,
    ): Instance;
  }
  function autocannon(options: Options): Instance;
  namespace autocannon {
    export type { Result };
  }
  export default autocannon;
}
