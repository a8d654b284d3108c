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
    non2xx: number;
  }
  interface Options {
    url: string;
    connections?: number;
    duration?: number;
  }
  function autocannon(options: Options): Promise<Result>;
  namespace autocannon {
    export type { Result };
  }
  export default autocannon;
}
