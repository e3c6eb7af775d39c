// A 409 says whose save won: a colleague by name, or "you" when the newer version is the caller's own
// (another tab, a script), with `error.latest.byYou` for a client to word it its own way.
import { beforeAll, describe, expect, it } from "vitest";
import * as versionsRoute from "@/app/api/sketches/[id]/versions/route";
import * as sketchesRoute from "@/app/api/workspaces/[id]/sketches/route";
import { call, makeAccount, makeWorkspace, type Person } from "./helpers";
import { edited, fixture } from "./sketch-fixtures";

let eddie: Person;
let olivia: Person;
let id: string;

const save = (who: Person, base: number, description: string) =>
  call(versionsRoute.POST, { method: "POST", params: { id }, cookie: who.cookie, body: { baseVersion: base, message: description, document: edited("pipe-bend-anchor", (d) => (d.description = description)) } });

beforeAll(async () => {
  eddie = await makeAccount("eddie", { name: "Eddie Conflict" });
  olivia = await makeAccount("olivia", { name: "Olivia Conflict" });
  const ws = await makeWorkspace("Conflicts", [
    [olivia, "owner"],
    [eddie, "editor"],
  ]);
  id = (await call(sketchesRoute.POST, { method: "POST", params: { id: ws }, cookie: eddie.cookie, body: { title: "Bend", document: fixture("pipe-bend-anchor") } })).body.sketch.id;
});

describe("the 409 of a stale save", () => {
  it("names the colleague whose save won", async () => {
    expect((await save(olivia, 1, "olivia's v2")).status).toBe(201);
    const lost = await save(eddie, 1, "eddie on v1");
    expect(lost.status).toBe(409);
    expect(lost.body.error.message).toBe("Olivia Conflict saved version 2 since you opened version 1. Nothing was overwritten.");
    expect(lost.body.error.latest).toMatchObject({ number: 2, authorName: "Olivia Conflict", byYou: false });
  });

  it("says it was the caller's own save when it was", async () => {
    expect((await save(eddie, 2, "eddie's v3 from a script")).status).toBe(201);
    const lost = await save(eddie, 2, "eddie again, from the other tab");
    expect(lost.status).toBe(409);
    expect(lost.body.error.message).toBe("You saved version 3 (in another tab or window, or by a script) since version 2 was opened here. Nothing was overwritten.");
    expect(lost.body.error.latest).toMatchObject({ number: 3, authorName: "Eddie Conflict", byYou: true });
  });
});
