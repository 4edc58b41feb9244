// s3rver ships no type declarations; this covers what storage-fake/s3.ts uses.
declare module "s3rver" {
  type Options = {
    port?: number;
    address?: string;
    directory: string;
    silent?: boolean;
    configureBuckets?: { name: string; configs: string[] }[];
  };
  export default class S3rver {
    constructor(options: Options);
    run(): Promise<unknown>;
    close(): Promise<void>;
  }
}
