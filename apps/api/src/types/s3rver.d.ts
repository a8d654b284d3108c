// s3rver ships no types; only what the tests and the cluster script use.
declare module 's3rver' {
  import type { AddressInfo } from 'node:net';
  interface S3rverOptions {
    address?: string;
    port?: number;
    silent?: boolean;
    directory?: string;
    configureBuckets?: Array<{ name: string; configs: string[] }>;
  }
  export default class S3rver {
    constructor(options: S3rverOptions);
    run(): Promise<AddressInfo>;
    close(): Promise<void>;
  }
}
