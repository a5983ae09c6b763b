// s3rver ships no type declarations; this is the part Polecourt uses.
declare module 's3rver' {
  interface S3rverOptions {
    address?: string;
    port?: number;
    directory?: string;
    silent?: boolean;
    configureBuckets?: { name: string; configs?: (string | Buffer)[] }[];
    allowMismatchedSignatures?: boolean;
    resetOnClose?: boolean;
  }
  export default class S3rver {
    constructor(options?: S3rverOptions);
    run(): Promise<unknown>;
    close(): Promise<void>;
  }
}
