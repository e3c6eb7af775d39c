import "server-only";
// Object storage through the S3 API (@aws-sdk/client-s3): a real bucket when S3_ENDPOINT is set,
// the local fake on loopback otherwise. Keys are made here, never by users.
import { DeleteObjectCommand, GetObjectCommand, HeadObjectCommand, PutObjectCommand, S3Client, type S3ClientConfig } from "@aws-sdk/client-s3";
import { getSignedUrl } from "@aws-sdk/s3-request-presigner";
import { randomUUID } from "node:crypto";
import { storageSettings, type StorageSettings } from "./env";

const globalForS3 = globalThis as unknown as { counterpoiseS3?: S3Client };

/**
 * The client's settings. A real bucket without S3_ACCESS_KEY_ID takes the SDK's default
 * credentials (AWS_* variables, a profile, the instance's or task's role), not an empty key.
 */
export function s3ClientConfig(st: StorageSettings): S3ClientConfig {
  return {
    endpoint: st.endpoint,
    region: st.region,
    forcePathStyle: st.forcePathStyle,
    ...(st.accessKeyId ? { credentials: { accessKeyId: st.accessKeyId, secretAccessKey: st.secretAccessKey } } : {}),
  };
}

/**
 * How long one call to the store may take. The SDK's own default is no limit at all: a store that
 * takes the connection and never answers (a hung fake, a proxy in front of a bucket) would hold an
 * upload, a drawing's image and the sweep forever. A call over its time fails (and the SDK tries
 * it again, three attempts in all), so the caller gets the store's 503 within about a minute.
 * The request time covers sending the body: 20 s passes a 10 MB file at 0.5 MB/s.
 */
export const STORAGE_TIMEOUTS = { connectMs: 3000, requestMs: 20000 };

/** The SDK's HTTP handler settings: `throwOnRequestTimeout`, or the request time only logs a warning. */
export function s3RequestHandler(t: { connectMs: number; requestMs: number } = STORAGE_TIMEOUTS) {
  return { connectionTimeout: t.connectMs, requestTimeout: t.requestMs, throwOnRequestTimeout: true };
}

export function s3(): S3Client {
  if (globalForS3.counterpoiseS3) return globalForS3.counterpoiseS3;
  const client = new S3Client({ ...s3ClientConfig(storageSettings()), requestHandler: s3RequestHandler() });
  globalForS3.counterpoiseS3 = client;
  return client;
}

const bucket = () => storageSettings().bucket;

/** A fresh storage key under a workspace: `w/<workspace>/<uuid>.<ext>`. */
export function newStorageKey(workspaceId: string, ext: string): string {
  return `w/${workspaceId}/${randomUUID()}.${ext.replace(/[^a-z0-9]/gi, "")}`;
}

export async function putObject(key: string, body: Buffer, contentType: string): Promise<void> {
  await s3().send(new PutObjectCommand({ Bucket: bucket(), Key: key, Body: body, ContentType: contentType, ContentLength: body.length }));
}

export async function getObject(key: string): Promise<Buffer> {
  const res = await s3().send(new GetObjectCommand({ Bucket: bucket(), Key: key }));
  const bytes = await res.Body!.transformToByteArray();
  return Buffer.from(bytes);
}

export async function objectExists(key: string): Promise<boolean> {
  try {
    await s3().send(new HeadObjectCommand({ Bucket: bucket(), Key: key }));
    return true;
  } catch (err) {
    const status = (err as { $metadata?: { httpStatusCode?: number } }).$metadata?.httpStatusCode;
    if (status === 404) return false;
    throw err;
  }
}

/**
 * Whether the store answers at all: any HTTP answer to a HEAD of a key that is never written (404,
 * or 403 for a key without list rights) counts; no connection or a 5xx does not.
 */
export async function storageAnswers(): Promise<boolean> {
  try {
    await s3().send(new HeadObjectCommand({ Bucket: bucket(), Key: "probe/storage-answers" }));
    return true;
  } catch (err) {
    const status = (err as { $metadata?: { httpStatusCode?: number } }).$metadata?.httpStatusCode;
    return status !== undefined && status < 500;
  }
}

export async function deleteObject(key: string): Promise<void> {
  await s3().send(new DeleteObjectCommand({ Bucket: bucket(), Key: key }));
}

/** A short-lived signed URL for reading an object (after the caller's role was checked). */
export async function signedReadUrl(key: string, seconds = 60): Promise<string> {
  return getSignedUrl(s3(), new GetObjectCommand({ Bucket: bucket(), Key: key }), { expiresIn: seconds });
}
