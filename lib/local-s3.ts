// The local stand-in for object storage: s3rver on loopback, started by scripts/local-services.ts.
import { mkdirSync } from "node:fs";
import S3rver from "s3rver";

export async function startS3Fake(opts: { port: number; bucket: string; directory: string }): Promise<() => Promise<void>> {
  mkdirSync(opts.directory, { recursive: true });
  const server = new S3rver({
    port: opts.port,
    address: "127.0.0.1",
    directory: opts.directory,
    silent: true,
    configureBuckets: [{ name: opts.bucket, configs: [] }],
  });
  await server.run();
  return async () => {
    await server.close();
  };
}
