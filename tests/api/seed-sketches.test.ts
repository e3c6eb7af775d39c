// The demo sketches: each scenario has two or three versions in the demo workspace whose
// statuses follow their messages, and seeding again changes nothing.
import { asc, eq, inArray } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db";
import { comment, signOff, sketch, sketchVersion } from "@/db/schema";
import { DEMO_WORKSPACE_ID, seedDemo } from "@/db/seed";
import { DEMO_SKETCHES } from "@/db/seed-sketches";

describe("demo sketches", () => {
  it("gives every demo scenario two or three versions that tell its story, idempotently", async () => {
    await seedDemo();
    await seedDemo();
    const ids = DEMO_SKETCHES.map((s) => s.id);
    const sketches = await db.select().from(sketch).where(inArray(sketch.id, ids));
    expect(sketches).toHaveLength(DEMO_SKETCHES.length);
    for (const s of sketches) expect(s.workspaceId).toBe(DEMO_WORKSPACE_ID);

    const rows = await db
      .select({ sketchId: sketchVersion.sketchId, number: sketchVersion.number, status: sketchVersion.status, message: sketchVersion.message })
      .from(sketchVersion)
      .where(inArray(sketchVersion.sketchId, ids))
      .orderBy(asc(sketchVersion.sketchId), asc(sketchVersion.number));
    const story = (id: string) => rows.filter((r) => r.sketchId === id).map((r) => `v${r.number} ${r.status}`);
    expect(story(DEMO_SKETCHES[0].id)).toEqual(["v1 holds", "v2 holds", "v3 holds"]);
    expect(story(DEMO_SKETCHES[1].id)).toEqual(["v1 holds", "v2 lifts", "v3 holds"]);
    expect(story(DEMO_SKETCHES[2].id)).toEqual(["v1 tips", "v2 holds", "v3 holds"]);
    expect(story(DEMO_SKETCHES[3].id)).toEqual(["v1 holds", "v2 holds"]);
    expect(story(DEMO_SKETCHES[4].id)).toEqual(["v1 holds", "v2 tips", "v3 holds"]);
    expect(story(DEMO_SKETCHES[5].id)).toEqual(["v1 holds", "v2 tips", "v3 holds"]);
    for (const s of sketches) expect(s.latestVersion).toBe(rows.filter((r) => r.sketchId === s.id).length);
    expect(rows.find((r) => r.sketchId === DEMO_SKETCHES[0].id && r.number === 3)?.message).toBe("Moved the rear bearer 0.3 m east to clear the drain channel");

    // the skid's rear bearer really moved 0.3 m east in v3
    const [v3] = await db.select().from(sketchVersion).where(eq(sketchVersion.sketchId, DEMO_SKETCHES[0].id)).orderBy(asc(sketchVersion.number)).offset(2);
    expect(v3.document.supports[0].at).toEqual([0.6, 0]);
  });

  it("shows the review at work: the skid's v2 approved (prepared, checked, approved), the trailer's v3 submitted with open threads", async () => {
    const versions = await db.select().from(sketchVersion).where(inArray(sketchVersion.sketchId, [DEMO_SKETCHES[0].id, DEMO_SKETCHES[1].id]));
    const skidV2 = versions.find((v) => v.sketchId === DEMO_SKETCHES[0].id && v.number === 2)!;
    const trailerV3 = versions.find((v) => v.sketchId === DEMO_SKETCHES[1].id && v.number === 3)!;
    expect([skidV2.reviewState, trailerV3.reviewState]).toEqual(["approved", "submitted"]);
    const steps = await db.select({ step: signOff.step, by: signOff.actorName }).from(signOff).where(eq(signOff.versionId, skidV2.id)).orderBy(asc(signOff.id));
    expect(steps).toEqual([
      { step: "submit", by: "Eddie Editor" },
      { step: "check", by: "Chen Checker" },
      { step: "approve", by: "Olivia Owner" },
    ]);
    const threads = await db.select().from(comment).where(eq(comment.versionId, trailerV3.id));
    expect(threads.map((c) => c.pin)).toEqual([{ kind: "element", elementId: "foot" }, null]);
  });
});
