// Comparing two saved versions: exactly the changed fields (with units), the parameters, and
// each support's reaction before and after, checked against two independent solves.
import { beforeAll, describe, expect, it } from "vitest";
import * as compareRoute from "@/app/api/sketches/[id]/compare/route";
import * as versionsRoute from "@/app/api/sketches/[id]/versions/route";
import * as sketchesRoute from "@/app/api/workspaces/[id]/sketches/route";
import { parseSketch, solve } from "@/solver";
import { call, makeAccount, makeWorkspace, type Person } from "./helpers";
import { fixture } from "./sketch-fixtures";

let eddie: Person;
let outsider: Person;
let sketchId: string;

const v1 = fixture("fire-monitor-trailer");
// eslint-disable-next-line @typescript-eslint/no-explicit-any
const v2: any = structuredClone(v1);
v2.parameters.Q = "1250 gpm"; // less flow
v2.bodies[0].mass = 1400; // ballast
v2.supports[2].at = [3.1, 0.3]; // the jack moves 0.3 m back
v2.supports[2].label = "front jack, moved";
v2.ports[0].angle = "theta + 5 deg";
v2.loads = [{ id: "wind", label: "wind on the riser", body: "trailer", kind: "force", at: [1.0, 2.0], magnitude: "300 N", angle: 180 }];
v2.massSources = [];

beforeAll(async () => {
  eddie = await makeAccount("eddie");
  outsider = await makeAccount("outsider");
  const ws = await makeWorkspace("Compare bay", [[eddie, "editor"]]);
  sketchId = (await call(sketchesRoute.POST, { method: "POST", params: { id: ws }, cookie: eddie.cookie, body: { title: "Monitor", document: v1 } })).body.sketch.id;
  const saved = await call(versionsRoute.POST, { method: "POST", params: { id: sketchId }, cookie: eddie.cookie, body: { baseVersion: 1, message: "ballast, less flow", document: v2 } });
  expect(saved.status).toBe(201);
});

function solved(doc: unknown) {
  const parsed = parseSketch(doc);
  if (!parsed.ok) throw new Error("does not parse");
  return solve(parsed.sketch);
}

describe("GET /api/sketches/:id/compare", () => {
  it("lists exactly what changed, field by field with units", async () => {
    const res = await call(compareRoute.GET, { params: { id: sketchId }, cookie: eddie.cookie, path: `/api/sketches/${sketchId}/compare?from=1&to=2` });
    expect(res.status).toBe(200);
    const c = res.body.comparison;
    expect(res.body.from).toMatchObject({ number: 1 });
    expect(res.body.to).toMatchObject({ number: 2, message: "ballast, less flow" });
    expect(c.sketch).toEqual([]);
    expect(c.parameters).toEqual({ added: [], removed: [], changed: [{ field: "Q", before: "2000 gpm", after: "1250 gpm" }] });
    expect(c.elements.added).toEqual([{ id: "wind", collection: "loads", kind: "force", label: "wind on the riser" }]);
    expect(c.elements.removed).toEqual([{ id: "supply", collection: "massSources", kind: "mass source", label: "hose supply (enters at rest)" }]);
    expect(c.elements.changed).toEqual([
      { id: "trailer", collection: "bodies", kind: "body", label: "Trailer", fields: [{ field: "mass", before: "1.1 t", after: "1.4 t" }] },
      {
        id: "jack",
        collection: "supports",
        kind: "contact",
        label: "front jack, moved",
        fields: [
          { field: "label", before: "front jack", after: "front jack, moved" },
          { field: "at", before: "(3.4, 0.3) m", after: "(3.1, 0.3) m" },
        ],
      },
      { id: "nozzle", collection: "ports", kind: "outlet", label: "monitor nozzle", fields: [{ field: "angle", before: "theta (= 15°)", after: "theta + 5 deg (= 20°)" }] },
    ]);
    expect(c.marks).toEqual({ before: { trailer: "changed", jack: "changed", nozzle: "changed", supply: "removed" }, after: { trailer: "changed", jack: "changed", nozzle: "changed", wind: "added" } });
  });

  it("writes the evaluated values in US customary units when asked (1 lb = 0.45359237 kg, NIST SP 811)", async () => {
    const res = await call(compareRoute.GET, { params: { id: sketchId }, cookie: eddie.cookie, path: `/api/sketches/${sketchId}/compare?from=1&to=2&units=US` });
    expect(res.status).toBe(200);
    const trailer = res.body.comparison.elements.changed.find((e: { id: string }) => e.id === "trailer");
    expect(trailer.fields).toEqual([{ field: "mass", before: "2,425 lb", after: "3,086 lb" }]);
  });

  it("gives every support's reaction before and after, the change and the status change, as two solves do", async () => {
    const res = await call(compareRoute.GET, { params: { id: sketchId }, cookie: eddie.cookie, path: `/api/sketches/${sketchId}/compare?from=1&to=2` });
    const c = res.body.comparison;
    const a = solved(v1);
    const b = solved(v2);
    expect(c.reactions.map((r: { id: string }) => r.id)).toEqual(["leg", "wheel", "jack"]);
    for (const r of c.reactions) {
      const before = Math.hypot(a.reactions[r.id].fx, a.reactions[r.id].fy);
      const after = Math.hypot(b.reactions[r.id].fx, b.reactions[r.id].fy);
      expect(r.before.resultant).toBeCloseTo(before, 6);
      expect(r.after.resultant).toBeCloseTo(after, 6);
      expect(r.change.abs).toBeCloseTo(after - before, 6);
      // a support that carried nothing before (the lifted jack) has no percentage
      if (before > 1e-9) expect(r.change.pct).toBeCloseTo(((after - before) / before) * 100, 6);
      else expect(r.change.pct).toBeNull();
      expect(r.before.state).toBe(a.reactions[r.id].state);
      expect(r.after.state).toBe(b.reactions[r.id].state);
    }
    // the jack lifted in v1 and bears in v2: the trailer goes from lifting to holding
    expect(a.bodies.trailer.status).toBe("lifts");
    expect(b.bodies.trailer.status).toBe("holds");
    expect(c.bodies).toEqual([{ id: "trailer", label: "Trailer", before: "lifts", after: "holds", words: "lifts → holds" }]);
    const jack = c.reactions.find((r: { id: string }) => r.id === "jack");
    expect(jack.stateChange).toBe("lifts → bearing"); // the tables' words
    expect(jack.before.resultant).toBe(0);
    expect(jack.change.abs).toBeGreaterThan(1000);
  });

  it("refuses a missing version, bad numbers and outsiders", async () => {
    const get = (q: string, who = eddie) => call(compareRoute.GET, { params: { id: sketchId }, cookie: who.cookie, path: `/api/sketches/${sketchId}/compare?${q}` });
    expect((await get("from=1&to=9")).status).toBe(404);
    const bad = await get("from=one&to=2");
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields[0].path).toBe("query.from");
    const units = await get("from=1&to=2&units=metric");
    expect(units.status).toBe(400);
    expect(units.body.error.fields[0].path).toBe("query.units");
    expect((await get("from=1&to=2", outsider)).status).toBe(404);
  });
});
