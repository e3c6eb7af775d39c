// A check or an approval given while comment threads are still open on the sketch — on the version
// itself, on an earlier one or on a later one, none of them approved — needs a note saying why it
// stands (`noteWhenThreadsOpen` in SIGN_OFF_RULES): refused on the server without one, naming the
// field and where the threads are; accepted with one, the note kept in the record; a resolved thread
// or a thread on an approved version asks for nothing.
import { beforeAll, describe, expect, it } from "vitest";
import * as commentRoute from "@/app/api/comments/[commentId]/route";
import * as commentsRoute from "@/app/api/sketches/[id]/versions/[number]/comments/route";
import * as signoffRoute from "@/app/api/sketches/[id]/versions/[number]/signoff/route";
import * as versionsRoute from "@/app/api/sketches/[id]/versions/route";
import { call, makeTeam, withMailFake, type Json, type Person } from "./helpers";
import { fixture } from "./sketch-fixtures";
import { postSketch } from "./sketch-setup";

let owner: Person;
let author: Person;
let checker: Person;
let ws: string;

withMailFake();
beforeAll(async () => {
  ({ ws, owner, author, checker } = await makeTeam("Open threads bay", { owner: "owner", author: "editor", checker: "checker" }, { prefix: "openthr" }));
});

const at = (id: string, n: number) => ({ id, number: String(n) });
const step = (id: string, n: number, who: Person, s: string, note?: string) =>
  call(signoffRoute.POST, { method: "POST", params: at(id, n), cookie: who.cookie, body: { step: s, ...(note ? { note } : {}) } });
const readSignOff = (id: string, n: number, who: Person) => call(signoffRoute.GET, { params: at(id, n), cookie: who.cookie });
async function thread(id: string, n: number, body: string): Promise<string> {
  const made = await call(commentsRoute.POST, { method: "POST", params: at(id, n), cookie: checker.cookie, body: { body } });
  expect(made.status).toBe(201);
  return made.body.comment.id;
}
const resolve = (commentId: string) => call(commentRoute.PATCH, { method: "PATCH", params: { commentId }, cookie: checker.cookie, body: { resolved: true } });

async function saveOnTop(id: string, base: number, theta: string) {
  const document = { ...fixture("pipe-bend-anchor"), parameters: { ...(fixture("pipe-bend-anchor").parameters as Json), theta } };
  const res = await call(versionsRoute.POST, { method: "POST", params: { id }, cookie: author.cookie, body: { baseVersion: base, message: `bend at ${theta}`, document } });
  expect(res.status).toBe(201);
}

describe("a check or an approval over open comment threads", () => {
  it("needs a note while a thread on an earlier version is open; the note is kept; resolving the thread lifts the need", async () => {
    const id = await postSketch(ws, author, `Anchor with a question ${Date.now()}`, "pipe-bend-anchor");
    const question = await thread(id, 1, "Is the anchor's bolt group checked for the bend at 60°?");
    await saveOnTop(id, 1, "75 deg");
    expect((await step(id, 2, author, "submit")).status).toBe(200);
    // the sign-off says where the open threads are
    expect((await readSignOff(id, 2, checker)).body.openThreads).toEqual([{ number: 1, open: 1 }]);

    const bare = await step(id, 2, checker, "check");
    expect(bare.status).toBe(400);
    expect(bare.body.error.code).toBe("validation_failed");
    const words = "1 comment thread is still open (1 on v1): resolve it, or say in the note why the version stands checked with it open.";
    expect(bare.body.error.message).toBe(words);
    expect(bare.body.error.fields).toEqual([{ path: "note", message: words }]);
    expect(bare.body.error.openThreads).toEqual([{ number: 1, open: 1 }]);
    // nothing was written
    expect((await readSignOff(id, 2, checker)).body.state).toBe("submitted");

    const noted = await step(id, 2, checker, "check", "Bolt group is for v1's bend; v2 changes the angle only, the question stays for site.");
    expect(noted.status).toBe(200);
    const checked = (await readSignOff(id, 2, owner)).body;
    expect(checked.state).toBe("checked");
    expect(checked.entries.at(-1)).toMatchObject({ step: "check", note: "Bolt group is for v1's bend; v2 changes the angle only, the question stays for site." });

    // the owner is asked the same; once the thread is resolved, no note is needed
    const asked = await step(id, 2, owner, "approve");
    expect(asked.status).toBe(400);
    expect(asked.body.error.message).toBe("1 comment thread is still open (1 on v1): resolve it, or say in the note why the version stands approved with it open.");
    expect((await resolve(question)).status).toBe(200);
    expect((await readSignOff(id, 2, owner)).body.openThreads).toEqual([]);
    expect((await step(id, 2, owner, "approve")).status).toBe(200);
  });

  it("counts the version's own threads and a later version's, and names each version", async () => {
    const id = await postSketch(ws, author, `Anchor asked twice ${Date.now()}`, "pipe-bend-anchor");
    await saveOnTop(id, 1, "75 deg");
    expect((await step(id, 2, author, "submit")).status).toBe(200);
    await thread(id, 2, "Thrust block size?");
    await thread(id, 2, "Which wall thickness is assumed?");
    await saveOnTop(id, 2, "80 deg");
    await thread(id, 3, "Does 80° still fit the pit?");
    expect((await readSignOff(id, 2, checker)).body.openThreads).toEqual([
      { number: 2, open: 2 },
      { number: 3, open: 1 },
    ]);
    const bare = await step(id, 2, checker, "check");
    expect(bare.status).toBe(400);
    expect(bare.body.error.message).toBe("3 comment threads are still open (2 on this version and 1 on v3): resolve them, or say in the note why the version stands checked with them open.");
    // a note of spaces is no note
    expect((await step(id, 2, checker, "check", "   ")).status).toBe(400);
    expect((await step(id, 2, checker, "check", "Answered in the thread replies; v3 is its own round.")).status).toBe(200);

    // the comments of each version say where else threads are open, both ways, as the sign-off counts them
    const comments = (n: number) => call(commentsRoute.GET, { params: at(id, n), cookie: checker.cookie });
    const v1 = (await comments(1)).body;
    expect([v1.earlierOpen, v1.laterOpen]).toEqual([[], [{ number: 2, open: 2 }, { number: 3, open: 1 }]]);
    const v2 = (await comments(2)).body;
    expect([v2.earlierOpen, v2.laterOpen]).toEqual([[], [{ number: 3, open: 1 }]]);
    const v3 = (await comments(3)).body;
    expect([v3.earlierOpen, v3.laterOpen]).toEqual([[{ number: 2, open: 2 }], []]);
  });

  it("asks nothing of submit and return, nor for threads on an approved version (locked: they cannot be resolved)", async () => {
    const id = await postSketch(ws, author, `Anchor approved with a thread ${Date.now()}`, "pipe-bend-anchor");
    await thread(id, 1, "A remark that stays on v1");
    expect((await step(id, 1, author, "submit")).status).toBe(200);
    expect((await step(id, 1, checker, "return", "See the remark.")).status).toBe(200);
    expect((await step(id, 1, author, "submit")).status).toBe(200);
    expect((await step(id, 1, checker, "check", "The remark is a site note, not a change.")).status).toBe(200);
    expect((await step(id, 1, owner, "approve", "Approved with the site note open.")).status).toBe(200);
    // v1 approved: its thread is locked, so v2's round is not held to it
    await saveOnTop(id, 1, "75 deg");
    expect((await readSignOff(id, 2, checker)).body.openThreads).toEqual([]);
    expect((await step(id, 2, author, "submit")).status).toBe(200);
    expect((await step(id, 2, checker, "check")).status).toBe(200);
    expect((await step(id, 2, owner, "approve")).status).toBe(200);
  });
});
