// "Waiting for you": each person sees the versions whose next sign-off step is theirs, decided by
// the sign-off rules (lib/review/rules.ts) — a checker the submitted ones they did not prepare,
// an owner the checked ones they neither prepared nor checked, an author their returned version
// until a newer one replaces it — and nobody outside the workspace sees any.
import { beforeAll, describe, expect, it } from "vitest";
import * as queueRoute from "@/app/api/workspaces/[id]/review-queue/route";
import * as signoffRoute from "@/app/api/sketches/[id]/versions/[number]/signoff/route";
import * as versionsRoute from "@/app/api/sketches/[id]/versions/route";
import { call, withMailFake, makeAccount, makeTeam, type Json, type Person } from "./helpers";
import { fixture } from "./sketch-fixtures";
import { postSketch } from "./sketch-setup";

let ws: string;
let owner: Person, editor: Person, checker: Person, viewer: Person, outsider: Person;

withMailFake();
beforeAll(async () => {
  ({ ws, owner, editor, checker, viewer } = await makeTeam("Queue", { owner: "owner", editor: "editor", checker: "checker", viewer: "viewer" }, { prefix: "q" }));
  outsider = await makeAccount("q-outsider");
});

async function sketchBy(who: Person, title: string): Promise<string> {
  return postSketch(ws, who, title, "pipe-bend-anchor");
}
const step = async (sketchId: string, number: number, who: Person, s: string, note = "") => {
  const r = await call(signoffRoute.POST, { method: "POST", params: { id: sketchId, number: String(number) }, cookie: who.cookie, body: { step: s, note } });
  expect(r.status, `${s}: ${JSON.stringify(r.body)}`).toBe(200);
};
const queueOf = async (who: Person) => {
  const r = await call(queueRoute.GET, { params: { id: ws }, cookie: who.cookie });
  return r.status === 200 ? (r.body as { items: Array<{ sketchTitle: string; number: number; action: string }> }).items.map((i) => `${i.action} ${i.sketchTitle} v${i.number}`).sort() : r.status;
};

describe("the sign-off steps waiting for each person", () => {
  it("submitted, checked and returned versions go to the people the rules name", async () => {
    const a = await sketchBy(editor, "Bend A");
    const b = await sketchBy(editor, "Bend B");
    const c = await sketchBy(editor, "Bend C");
    await step(a, 1, editor, "submit");
    await step(b, 1, editor, "submit");
    await step(b, 1, checker, "check");
    await step(c, 1, editor, "submit");
    await step(c, 1, checker, "return", "The anchor block is not sized.");

    // the checker: A to check; B they checked (approval is an owner's); C returned
    expect(await queueOf(checker)).toEqual(["check Bend A v1"]);
    // the owner may check too, and approves what someone else checked
    expect(await queueOf(owner)).toEqual(["approve Bend B v1", "check Bend A v1"]);
    // the author: C to revise (never their own to check)
    expect(await queueOf(editor)).toEqual(["revise Bend C v1"]);
    expect(await queueOf(viewer)).toEqual([]);
    // outside the workspace: not found, as everywhere
    expect(await queueOf(outsider)).toBe(404);

    // a newer version replaces the returned one: nothing left to revise
    const doc = fixture("pipe-bend-anchor") as { parameters: Record<string, string> };
    const saved = await call(versionsRoute.POST, { method: "POST", params: { id: c }, cookie: editor.cookie, body: { baseVersion: 1, message: "Anchor block sized", document: { ...doc, parameters: { ...doc.parameters, p1: "500 kPa" } } } });
    expect(saved.status).toBe(201);
    expect(await queueOf(editor)).toEqual([]);
    // approved, B leaves the owner's list
    await step(b, 1, owner, "approve");
    expect(await queueOf(owner)).toEqual(["check Bend A v1"]);
    // its approval withdrawn, B is its author's to revise again (and nobody else's)
    await step(b, 1, owner, "withdraw", "The bend's angle changed on site.");
    expect(await queueOf(editor)).toEqual(["revise Bend B v1"]);
    expect(await queueOf(owner)).toEqual(["check Bend A v1"]);
  });

  it("a submitted version with a newer one saved since stays to check, and says which version is newer; the newer one joins once submitted", async () => {
    const d = await sketchBy(editor, "Bend D");
    await step(d, 1, editor, "submit");
    const items = async (who: Person) => ((await call(queueRoute.GET, { params: { id: ws }, cookie: who.cookie })).body.items as Json[]).filter((i) => i.sketchTitle === "Bend D").map((i) => [i.action, i.number, i.newer]).sort((a, b) => a[1] - b[1]);
    expect(await items(checker)).toEqual([["check", 1, null]]);
    const doc = fixture("pipe-bend-anchor") as { parameters: Record<string, string> };
    const saved = await call(versionsRoute.POST, { method: "POST", params: { id: d }, cookie: editor.cookie, body: { baseVersion: 1, message: "Bend turned", document: { ...doc, parameters: { ...doc.parameters, theta: "75 deg" } } } });
    expect(saved.status).toBe(201);
    expect(await items(checker)).toEqual([["check", 1, 2]]);
    await step(d, 2, editor, "submit");
    expect(await items(checker)).toEqual([
      ["check", 1, 2],
      ["check", 2, null],
    ]);
  });
});
