// The S3 client's settings for a real bucket: a key when one is configured, and otherwise the SDK's
// own credential chain (an instance or task role), never an empty key that every request would fail with.
import { describe, expect, it } from "vitest";
import type { StorageSettings } from "@/lib/env";
import { s3ClientConfig } from "@/lib/storage";

const real: StorageSettings = { kind: "real", endpoint: "https://s3.eu-central-1.amazonaws.com", region: "eu-central-1", bucket: "calcs", accessKeyId: "", secretAccessKey: "", forcePathStyle: false, port: 4569 };

describe("s3ClientConfig", () => {
  it("passes a configured key, the region and the addressing style", () => {
    expect(s3ClientConfig({ ...real, accessKeyId: "AKIDEXAMPLE", secretAccessKey: "secret", forcePathStyle: true })).toEqual({
      endpoint: real.endpoint,
      region: "eu-central-1",
      forcePathStyle: true,
      credentials: { accessKeyId: "AKIDEXAMPLE", secretAccessKey: "secret" },
    });
  });
  it("without S3_ACCESS_KEY_ID leaves the credentials to the SDK's default chain", () => {
    const c = s3ClientConfig(real);
    expect("credentials" in c).toBe(false);
    expect(c).toEqual({ endpoint: real.endpoint, region: "eu-central-1", forcePathStyle: false });
  });
});
