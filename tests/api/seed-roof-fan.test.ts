// The roof-fan demo (an invented scenario) in the demo workspace: three versions whose statuses
// follow their messages, its review at work (v1 returned with the checker's reason, v3 checked),
// and the checker's thread on v2 pinned to the foot that lifts, answered and resolved.
import { asc, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db";
import { comment, signOff, sketch, sketchVersion } from "@/db/schema";
import { DEMO_WORKSPACE_ID, seedDemo } from "@/db/seed";

const FAN = "6d656d6f-0000-4000-8000-0000000000a7";

describe("the roof-fan demo", () => {
  it("is seeded as a7 with three versions: holds, tips at the design wind, holds when bolted", async () => {
    await seedDemo();
    const [row] = await db.select().from(sketch).where(eq(sketch.id, FAN));
    expect(row.workspaceId).toBe(DEMO_WORKSPACE_ID);
    expect(row.title).toBe("Roof extract fan on its frame");
    expect(row.latestVersion).toBe(3);
    const versions = await db.select().from(sketchVersion).where(eq(sketchVersion.sketchId, FAN)).orderBy(asc(sketchVersion.number));
    expect(versions.map((v) => `v${v.number} ${v.status} ${v.reviewState}`)).toEqual(["v1 holds returned", "v2 tips draft", "v3 holds checked"]);
    // v3 bolted: a pin at the inlet end and a roller in slotted holes at the discharge end
    expect(versions[2].document.supports.map((s) => s.kind)).toEqual(["pin", "roller"]);
    expect(versions[2].checkedBy).toBe("demo-chen-checker");
  });

  it("shows why v1 went back and what the checker found on v3", async () => {
    const versions = await db.select({ id: sketchVersion.id, number: sketchVersion.number }).from(sketchVersion).where(eq(sketchVersion.sketchId, FAN)).orderBy(asc(sketchVersion.number));
    const steps = async (n: number) =>
      (await db.select().from(signOff).where(eq(signOff.versionId, versions[n - 1].id)).orderBy(asc(signOff.id))).map((s) => [s.step, s.actorName, s.note]);
    expect(await steps(1)).toEqual([
      ["submit", "Eddie Editor", ""],
      ["return", "Chen Checker", "30 m/s is the open-ground figure: the wind report gives 45 m/s at the roof edge. Please run the wind cases at 45 m/s."],
    ]);
    expect((await steps(3)).map(([step, by]) => [step, by])).toEqual([
      ["submit", "Eddie Editor"],
      ["check", "Chen Checker"],
    ]);
    const threads = await db.select().from(comment).where(eq(comment.versionId, versions[1].id));
    expect(threads).toHaveLength(2);
    const root = threads.find((c) => c.parentId === null)!;
    expect(root.pin).toEqual({ kind: "element", elementId: "outlet_foot" });
    expect(root.resolvedBy).toBe("demo-chen-checker");
    expect(threads.find((c) => c.parentId === root.id)?.authorId).toBe("demo-eddie-editor");
  });
});
