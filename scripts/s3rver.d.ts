// s3rver ships no types; the few options scripts/fakes.ts uses.
declare module 's3rver' {
  import type { Server } from 'node:http';
  type Options = {
    address?: string;
    port?: number;
    directory?: string;
    silent?: boolean;
    configureBuckets?: { name: string; configs: (string | Buffer)[] }[];
  };
  export default class S3rver {
    constructor(options: Options);
    run(): Promise<unknown>;
    /** The HTTP server, once run() has resolved. */
    httpServer: Server;
    close(): Promise<void>;
  }
}
