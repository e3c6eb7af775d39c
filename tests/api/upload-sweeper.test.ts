// The server's own sweep of unsaved underlays: it runs at start-up and then on a timer, without
// waiting for a new upload; a database or file store that is down is logged, never thrown.
import { ListObjectsV2Command, S3Client } from "@aws-sdk/client-s3";
import { eq, inArray } from "drizzle-orm";
import { afterEach, beforeAll, describe, expect, it, vi } from "vitest";
import * as sketchUploadsRoute from "@/app/api/sketches/[id]/uploads/route";
import * as versionsRoute from "@/app/api/sketches/[id]/versions/route";
import * as sketchesRoute from "@/app/api/workspaces/[id]/sketches/route";
import { db } from "@/db";
import { upload } from "@/db/schema";
import { appOrigin, storageSettings } from "@/lib/env";
import { s3 } from "@/lib/storage";
import { startUnderlaySweeper, sweepRound, SWEEP_DEFAULTS } from "@/lib/uploads/sweep";
import { png } from "../fixtures/uploads";
import { call, makeAccount, makeWorkspace, type Person } from "./helpers";
import { fixture } from "./sketch-fixtures";

type Handler = (req: Request, ctx: { params: Promise<Record<string, string>> }) => Promise<Response>;
const globalForS3 = globalThis as unknown as { counterpoiseS3?: S3Client };
const globalForSweeper = globalThis as unknown as { counterpoiseUnderlaySweeper?: { stop: () => void } };

let eddie: Person;

beforeAll(async () => {
  eddie = await makeAccount("sweeper-eddie");
});

afterEach(() => {
  globalForSweeper.counterpoiseUnderlaySweeper?.stop();
  vi.useRealTimers();
  vi.restoreAllMocks();
});

async function bucketKeys(workspaceId: string): Promise<string[]> {
  const out = await s3().send(new ListObjectsV2Command({ Bucket: storageSettings().bucket, Prefix: `w/${workspaceId}/` }));
  return (out.Contents ?? []).map((o) => o.Key!);
}

/** A workspace with a saved sketch and three underlays: one drawn by v2, one left unsaved, one recent. */
async function bayWithUnderlays(name: string) {
  const bay = await makeWorkspace(name, [[eddie, "editor"]]);
  const made = await call(sketchesRoute.POST, { method: "POST", params: { id: bay }, cookie: eddie.cookie, body: { title: "Skid", document: fixture("pump-skid-discharge") } });
  const sketchId = made.body.sketch.id as string;
  const up = async (side: number) => {
    const form = new FormData();
    form.set("file", new Blob([new Uint8Array(await png(side, side))], { type: "image/png" }), "drawing.png");
    const req = new Request(`${appOrigin()}/api/sketches/${sketchId}/uploads`, { method: "POST", headers: { cookie: eddie.cookie, origin: appOrigin() }, body: form });
    const res = await (sketchUploadsRoute.POST as Handler)(req, { params: Promise.resolve({ id: sketchId }) });
    expect(res.status).toBe(201);
    return (await res.json()).upload.id as string;
  };
  const saved = await up(32);
  const unsaved = await up(30);
  const recent = await up(34);
  const document = { ...fixture("pump-skid-discharge"), version: 3, underlay: { upload: saved, width: 32, height: 32, origin: [0, 0], metresPerPixel: 0.01 } };
  expect((await call(versionsRoute.POST, { method: "POST", params: { id: sketchId }, cookie: eddie.cookie, body: { baseVersion: 1, document } })).status).toBe(201);
  // eight days old: past the seven days an unsaved underlay is kept
  const eightDaysAgo = new Date(Date.now() - 8 * 24 * 3600_000);
  await db.update(upload).set({ createdAt: eightDaysAgo }).where(inArray(upload.id, [saved, unsaved]));
  const [unsavedRow] = await db.select().from(upload).where(eq(upload.id, unsaved));
  expect(await bucketKeys(bay)).toHaveLength(6);
  return { bay, saved, unsaved, recent, unsavedKeys: [unsavedRow.storageKey, unsavedRow.thumbnailKey] };
}

const idsIn = async (bay: string) => (await db.select({ id: upload.id }).from(upload).where(eq(upload.workspaceId, bay))).map((r) => r.id).sort();

describe("the background sweep of unsaved underlays", () => {
  it("at start-up clears an old unsaved underlay in every workspace, with no new upload; saved and recent ones stay", async () => {
    const a = await bayWithUnderlays("Sweeper bay A");
    const b = await bayWithUnderlays("Sweeper bay B");
    const sweeper = startUnderlaySweeper({ intervalMinutes: 60 })!;
    await sweeper.idle();
    for (const x of [a, b]) {
      expect(await idsIn(x.bay)).toEqual([x.saved, x.recent].sort());
      const keys = await bucketKeys(x.bay);
      expect(keys).toHaveLength(4);
      for (const k of x.unsavedKeys) expect(keys).not.toContain(k);
    }
  });

  it("runs again every interval, never two rounds at once, and its timer does not hold the process open", async () => {
    vi.useFakeTimers();
    const intervals: NodeJS.Timeout[] = [];
    const realSetInterval = setInterval;
    vi.spyOn(globalThis, "setInterval").mockImplementation(((fn: () => void, ms: number) => {
      const t = realSetInterval(fn, ms);
      intervals.push(t);
      return t;
    }) as typeof setInterval);
    let calls = 0;
    let release: (() => void) | null = null;
    const sweep = () => {
      calls++;
      return new Promise<string[]>((resolve) => {
        release = () => resolve([]);
      });
    };
    const sweeper = startUnderlaySweeper({ intervalMinutes: 30, sweep })!;
    expect(calls).toBe(1); // at start, without waiting for the first interval
    expect(intervals).toHaveLength(1);
    expect(intervals[0].hasRef()).toBe(false);
    // the first round still runs when the next is due: it is not doubled
    await vi.advanceTimersByTimeAsync(30 * 60_000);
    expect(calls).toBe(1);
    release!();
    await sweeper.idle();
    await vi.advanceTimersByTimeAsync(30 * 60_000);
    expect(calls).toBe(2);
    release!();
    await vi.advanceTimersByTimeAsync(29 * 60_000);
    expect(calls).toBe(2);
    await vi.advanceTimersByTimeAsync(60_000);
    expect(calls).toBe(3);
    // a second start in the same process is the same sweeper
    expect(startUnderlaySweeper({ intervalMinutes: 30, sweep })).toBe(sweeper);
    sweeper.stop();
    release!();
    await vi.advanceTimersByTimeAsync(120 * 60_000);
    expect(calls).toBe(3);
  });

  it("a database that is down is logged, and the next round tries again", async () => {
    vi.useFakeTimers();
    const logged = vi.spyOn(console, "error").mockImplementation(() => undefined);
    let calls = 0;
    const sweep = async () => {
      calls++;
      if (calls === 1) throw new Error("connect ECONNREFUSED 127.0.0.1:5432");
      return [];
    };
    const sweeper = startUnderlaySweeper({ intervalMinutes: 5, sweep })!;
    await sweeper.idle();
    expect(logged).toHaveBeenCalledWith(expect.stringMatching(/sweep of unused underlays failed; the next round tries again/), expect.objectContaining({ message: expect.stringMatching(/ECONNREFUSED/) }));
    await vi.advanceTimersByTimeAsync(5 * 60_000);
    expect(calls).toBe(2);
  });

  it("a file store that is down: nothing thrown, and the rows wait so no object is left behind", async () => {
    const x = await bayWithUnderlays("Sweeper bay, store down");
    const logged = vi.spyOn(console, "error").mockImplementation(() => undefined);
    const working = s3();
    // a port nothing listens on
    globalForS3.counterpoiseS3 = new S3Client({ endpoint: "http://127.0.0.1:9", region: "us-east-1", forcePathStyle: true, credentials: { accessKeyId: "x", secretAccessKey: "x" }, maxAttempts: 1 });
    try {
      expect(await sweepRound()).toBe(0);
    } finally {
      globalForS3.counterpoiseS3 = working;
    }
    expect(logged).toHaveBeenCalledWith(expect.stringMatching(/file store is not answering/));
    expect(await idsIn(x.bay)).toEqual([x.saved, x.unsaved, x.recent].sort());
    // with the store back, the next round takes it, objects and all
    await sweepRound();
    expect(await idsIn(x.bay)).toEqual([x.saved, x.recent].sort());
    for (const k of x.unsavedKeys) expect(await bucketKeys(x.bay)).not.toContain(k);
  });

  it("takes batch after batch in one round until a batch comes back short", async () => {
    const batches = [SWEEP_DEFAULTS.limit, SWEEP_DEFAULTS.limit, 7, 0];
    let i = 0;
    const sweep = async () => Array.from({ length: batches[i++] }, (_, k) => `id-${i}-${k}`);
    expect(await sweepRound({ sweep })).toBe(2 * SWEEP_DEFAULTS.limit + 7);
    expect(i).toBe(3);
  });

  it("UPLOAD_SWEEP_MINUTES=0 turns it off; a value that is not a number is named in the log", async () => {
    vi.stubEnv("UPLOAD_SWEEP_MINUTES", "0");
    const sweep = vi.fn(async () => []);
    expect(startUnderlaySweeper({ sweep })).toBeNull();
    expect(sweep).not.toHaveBeenCalled();
    vi.stubEnv("UPLOAD_SWEEP_MINUTES", "hourly");
    const logged = vi.spyOn(console, "error").mockImplementation(() => undefined);
    const sweeper = startUnderlaySweeper({ sweep })!;
    expect(logged).toHaveBeenCalledWith(expect.stringMatching(/UPLOAD_SWEEP_MINUTES must be a number of minutes .* not "hourly"; sweeping every 60 minutes/));
    await sweeper.idle();
    expect(sweep).toHaveBeenCalledTimes(1);
    vi.unstubAllEnvs();
  });

  it("instrumentation's register starts it in the Node.js server, and not during next build", async () => {
    const { register } = await import("@/instrumentation");
    vi.stubEnv("NEXT_RUNTIME", "nodejs");
    vi.stubEnv("NEXT_PHASE", "phase-production-build");
    await register();
    expect(globalForSweeper.counterpoiseUnderlaySweeper).toBeUndefined();
    vi.stubEnv("NEXT_PHASE", "phase-production-server");
    await register();
    const started = globalForSweeper.counterpoiseUnderlaySweeper as { idle: () => Promise<void> } | undefined;
    expect(started).toBeDefined();
    await started!.idle();
    vi.unstubAllEnvs();
  });
});
