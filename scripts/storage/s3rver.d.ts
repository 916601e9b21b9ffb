// The part of s3rver 3.x (which ships no types) that the fake S3 script and tests use.
declare module "s3rver" {
  interface S3rverOptions {
    port?: number;
    address?: string;
    directory: string;
    silent?: boolean;
    resetOnClose?: boolean;
    configureBuckets?: { name: string; configs: (string | Buffer)[] }[];
  }
  export default class S3rver {
    constructor(options: S3rverOptions);
    run(): Promise<{ address: string; port: number }>;
    close(): Promise<void>;
  }
}
