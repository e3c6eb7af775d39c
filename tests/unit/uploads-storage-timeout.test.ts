// A file store that takes the connection and never answers (a hung fake, a stuck proxy in front
// of a bucket) must fail the call in bounded time, so an upload answers 503 instead of hanging.
import { createServer, type Server, type Socket } from "node:net";
import type { S3Client } from "@aws-sdk/client-s3";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { putObject, s3RequestHandler, STORAGE_TIMEOUTS } from "@/lib/storage";

const globalForS3 = globalThis as unknown as { counterpoiseS3?: S3Client };

let server: Server;
let port = 0;
const sockets: Socket[] = [];
const ENV = ["S3_ENDPOINT", "S3_ACCESS_KEY_ID", "S3_SECRET_ACCESS_KEY"] as const;
const saved = { env: Object.fromEntries(ENV.map((k) => [k, process.env[k]])), timeouts: { ...STORAGE_TIMEOUTS }, client: globalForS3.counterpoiseS3 };

beforeAll(async () => {
  // reads every request, answers none
  server = createServer((s) => {
    sockets.push(s);
    s.on("data", () => undefined);
  });
  await new Promise<void>((ok) => server.listen(0, "127.0.0.1", ok));
  port = (server.address() as { port: number }).port;
});

afterAll(async () => {
  for (const s of sockets) s.destroy();
  await new Promise((ok) => server.close(ok));
  for (const k of ENV) {
    if (saved.env[k] === undefined) delete process.env[k];
    else process.env[k] = saved.env[k];
  }
  Object.assign(STORAGE_TIMEOUTS, saved.timeouts);
  globalForS3.counterpoiseS3 = saved.client;
});

describe("the file store's time limits", () => {
  it("every call has a connection and a request time, and running over it is an error, not a warning", () => {
    const h = s3RequestHandler();
    expect(h.throwOnRequestTimeout).toBe(true);
    expect(h.connectionTimeout).toBeGreaterThan(0);
    expect(h.requestTimeout).toBeGreaterThan(0);
    // three attempts in all stay within about a minute
    expect(3 * (h.connectionTimeout + h.requestTimeout)).toBeLessThanOrEqual(75_000);
  });

  it("a store that never answers fails the put within its time limits", async () => {
    Object.assign(process.env, { S3_ENDPOINT: `http://127.0.0.1:${port}`, S3_ACCESS_KEY_ID: "test", S3_SECRET_ACCESS_KEY: "test" });
    Object.assign(STORAGE_TIMEOUTS, { connectMs: 300, requestMs: 400 });
    delete globalForS3.counterpoiseS3;
    const started = Date.now();
    const outcome = await Promise.race([
      putObject("w/test/never-answered.png", Buffer.from("x"), "image/png").then(
        () => "stored",
        (err: Error) => `failed: ${err.name}`,
      ),
      new Promise<string>((ok) => setTimeout(() => ok("still waiting"), 8000)),
    ]);
    expect(outcome).toBe("failed: TimeoutError");
    expect(Date.now() - started).toBeLessThan(8000);
    expect(sockets.length).toBeGreaterThan(0);
  }, 15000);
});
