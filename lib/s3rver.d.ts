declare module "s3rver" {
  interface S3rverOptions {
    port?: number;
    address?: string;
    directory: string;
    silent?: boolean;
    resetOnClose?: boolean;
    configureBuckets?: Array<{ name: string; configs: Array<string | Buffer> }>;
  }
  export default class S3rver {
    constructor(options: S3rverOptions);
    run(): Promise<{ address: string; port: number }>;
    close(): Promise<void>;
  }
}
