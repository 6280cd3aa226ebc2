// s3rver ships no type declarations; this covers the part the fakes script uses.
declare module "s3rver" {
  interface S3rverOptions {
    address?: string;
    port?: number;
    directory: string;
    silent?: boolean;
    configureBuckets?: { name: string; configs: string[] }[];
  }
  export default class S3rver {
    constructor(options: S3rverOptions);
    run(): Promise<unknown>;
    close(): Promise<void>;
  }
}
