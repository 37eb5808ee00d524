// s3rver (a local S3-compatible fake used by the photo storage tests) ships no types; this is the part we use.
declare module 's3rver' {
  interface S3rverOptions {
    port?: number;
    address?: string;
    silent?: boolean;
    directory: string;
  }
  export default class S3rver {
    constructor(options: S3rverOptions);
    run(): Promise<{ address: string; family: string; port: number }>;
    close(): Promise<void>;
  }
}
