// The demo sketches: each scenario has two or three versions in the demo workspace whose
// statuses follow their messages, and seeding again changes nothing — but a demo an earlier
// release seeded differently, which nobody has touched since, is seeded afresh.
import { and, asc, eq, inArray } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db";
import { auditEvent, comment, membership, signOff, sketch, sketchVersion, workspace } from "@/db/schema";
import { DEMO_WORKSPACE_ID, seedDemo } from "@/db/seed";
import { DEMO_SKETCHES, seedDemoSketches, type DemoSketch } from "@/db/seed-sketches";

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
    expect(story(DEMO_SKETCHES[6].id)).toEqual(["v1 holds", "v2 tips", "v3 holds"]);
    for (const s of sketches) expect(s.latestVersion).toBe(rows.filter((r) => r.sketchId === s.id).length);
    expect(rows.find((r) => r.sketchId === DEMO_SKETCHES[0].id && r.number === 3)?.message).toBe("Moved the rear bearer 0.3 m east to clear the drain channel");

    // the skid's rear bearer really moved 0.3 m east in v3
    const [v3] = await db.select().from(sketchVersion).where(eq(sketchVersion.sketchId, DEMO_SKETCHES[0].id)).orderBy(asc(sketchVersion.number)).offset(2);
    expect(v3.document.supports[0].at).toEqual([0.6, 0]);
  });

  it("reads in order: the workspace founded, then its people joined, then their first versions saved", async () => {
    await seedDemo();
    const [ws] = await db.select().from(workspace).where(eq(workspace.id, DEMO_WORKSPACE_ID));
    const members = await db.select().from(membership).where(eq(membership.workspaceId, DEMO_WORKSPACE_ID));
    const versions = await db.select().from(sketchVersion).where(inArray(sketchVersion.sketchId, DEMO_SKETCHES.map((d) => d.id)));
    const firstSave = Math.min(...versions.map((v) => v.createdAt.getTime()));
    expect(ws.createdAt.getTime()).toBeLessThan(firstSave);
    for (const m of members) {
      expect(m.createdAt.getTime()).toBeGreaterThanOrEqual(ws.createdAt.getTime());
      const own = versions.filter((v) => v.authorId === m.userId).map((v) => v.createdAt.getTime());
      if (own.length) expect(m.createdAt.getTime()).toBeLessThan(Math.min(...own));
    }
    const [founded] = await db.select().from(auditEvent).where(and(eq(auditEvent.workspaceId, DEMO_WORKSPACE_ID), eq(auditEvent.action, "workspace.create")));
    // the founding event is dated with the workspace (within a second: a database seeded by an
    // earlier release kept its own rows)
    expect(Math.abs(founded.at.getTime() - ws.createdAt.getTime())).toBeLessThan(1000);
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
    expect(threads.map((c) => c.pin)).toEqual([{ kind: "element", elementId: "axle" }, null]);
  });

  describe("after an update that changed a demo", () => {
    // the trailer: three versions, a sign-off step and comment threads
    const demo = DEMO_SKETCHES.find((d) => d.id.endsWith("a2"))!;
    // an earlier release: other words, the ballast not yet moved toward the front in v3
    const steps = demo.steps.map((st, i) => (i === demo.steps.length - 1 ? { ...st, edit: (d: Parameters<NonNullable<typeof st.edit>>[0]) => (d.bodies[0].mass = "1250 kg") } : st));
    const older: DemoSketch = { ...demo, description: "An earlier release's words", steps };
    const seedOlder = async () => {
      await db.delete(sketch).where(eq(sketch.id, demo.id));
      await db.delete(auditEvent).where(and(eq(auditEvent.targetType, "sketch"), eq(auditEvent.targetId, demo.id)));
      await seedDemoSketches(db, DEMO_WORKSPACE_ID, [older]);
    };
    const stored = async () => {
      const [row] = await db.select().from(sketch).where(eq(sketch.id, demo.id));
      const versions = await db.select({ id: sketchVersion.id }).from(sketchVersion).where(eq(sketchVersion.sketchId, demo.id)).orderBy(asc(sketchVersion.number));
      const creates = await db.select().from(auditEvent).where(and(eq(auditEvent.targetId, demo.id), eq(auditEvent.action, "sketch.create")));
      return { row, versionIds: versions.map((v) => v.id), creates: creates.length };
    };

    it("seeds afresh a demo left as an earlier release seeded it, once", async () => {
      await seedOlder();
      expect((await stored()).row.description).toBe(older.description);
      await seedDemo();
      const now = await stored();
      expect(now.row.description).toBe(demo.description);
      expect(now.row.latestVersion).toBe(demo.steps.length);
      expect(now.versionIds).toHaveLength(demo.steps.length);
      expect(now.creates).toBe(1); // its history in the audit log is the new seed's, not both
      const [v3] = await db.select().from(sketchVersion).where(eq(sketchVersion.id, now.versionIds[2]));
      expect(v3.document.bodies[0].cg).toEqual([2.1, 0.85]);
      // the new seed's review came with it, once
      const threads = await db.select().from(comment).where(inArray(comment.versionId, now.versionIds));
      expect(threads).toHaveLength(demo.comments!.length);
      // seeded as this release seeds it: left alone from now on
      await seedDemo();
      expect((await stored()).versionIds).toEqual(now.versionIds);
    });

    it("leaves alone a demo someone has commented on, renamed or saved", async () => {
      const touches: Array<[string, () => Promise<unknown>]> = [
        ["a comment", async () => {
          const [v1] = (await stored()).versionIds;
          await db.insert(comment).values({ versionId: v1, authorId: "demo-chen-checker", body: "Is the jack on a plate?" });
        }],
        ["a sign-off step", async () => {
          const [, , v3] = (await stored()).versionIds;
          await db.insert(signOff).values({ versionId: v3, step: "check", fromState: "submitted", toState: "checked", actorId: "demo-chen-checker", actorName: "Chen Checker", note: "" });
        }],
        ["a new title", () => db.update(sketch).set({ title: "Trailer at the quay", updatedAt: new Date(Date.now() + 3_600_000) }).where(eq(sketch.id, demo.id))],
        ["a version saved by someone else", async () => {
          const [last] = await db.select().from(sketchVersion).where(eq(sketchVersion.sketchId, demo.id)).orderBy(asc(sketchVersion.number)).offset(2);
          await db.insert(sketchVersion).values({ ...last, id: undefined, number: 4, authorId: "demo-eddie-editor", message: "moved the jack", reviewState: "draft", createdAt: new Date() });
          await db.update(sketch).set({ latestVersion: 4, updatedAt: new Date() }).where(eq(sketch.id, demo.id));
        }],
      ];
      for (const [what, touch] of touches) {
        await seedOlder();
        await touch();
        const before = await stored();
        await seedDemo();
        const after = await stored();
        expect(after.row.description, what).toBe(older.description);
        expect(after.versionIds, what).toEqual(before.versionIds);
      }
      // back to the demo as seeded, for the tests after this one
      await db.delete(sketch).where(eq(sketch.id, demo.id));
      await db.delete(auditEvent).where(and(eq(auditEvent.targetType, "sketch"), eq(auditEvent.targetId, demo.id)));
      await seedDemo();
      expect((await stored()).row.description).toBe(demo.description);
    });
  });
});
