// The parts of s3rver (the local fake object store) that server/dev/fake-s3.ts uses; the package ships no types.
declare module 's3rver' {
  import type { AddressInfo } from 'node:net';

  interface S3rverOptions {
    address?: string;
    port?: number;
    directory?: string;
    silent?: boolean;
    resetOnClose?: boolean;
    configureBuckets?: { name: string }[];
  }

  export default class S3rver {
    constructor(options: S3rverOptions);
    run(): Promise<AddressInfo>;
    close(): Promise<void>;
  }
}
