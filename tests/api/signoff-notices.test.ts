// What a sign-off step tells others: mail to the people it concerns (never the one who took it),
// an entry in the sketch's activity feed, and the approved version named in the listings.
import { eq, like } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import * as activityRoute from "@/app/api/sketches/[id]/activity/route";
import * as sketchRoute from "@/app/api/sketches/[id]/route";
import * as signoffRoute from "@/app/api/sketches/[id]/versions/[number]/signoff/route";
import * as sketchesRoute from "@/app/api/workspaces/[id]/sketches/route";
import { db } from "@/db";
import { devMail, user } from "@/db/schema";
import { call, withMailFake, makeTeam, waitForMail, type Json, type Person } from "./helpers";
import { postSketch } from "./sketch-setup";

let owner: Person;
let author: Person;
let checker: Person;
let viewer: Person;
let ws: string;
let sketchId: string;
const title = `Notice skid ${Date.now()}`;

withMailFake();
beforeAll(async () => {
  ({ ws, owner, author, checker, viewer } = await makeTeam("Notice bay", { owner: "owner", author: "editor", checker: "checker", viewer: "viewer" }, { prefix: "notice" }));
  sketchId = await postSketch(ws, author, title, "pipe-bend-anchor");
});

const take = (who: Person, step: string, note?: string) =>
  call(signoffRoute.POST, { method: "POST", params: { id: sketchId, number: "1" }, cookie: who.cookie, body: { step, ...(note ? { note } : {}) } });

/** Every mail about this sketch, as [recipient, subject ending], once the expected ones arrived. */
async function mailsAbout(): Promise<Array<[string, string]>> {
  const rows = await db.select().from(devMail).where(like(devMail.subject, `%${title}%`));
  const email = (p: Person) => p.email.toLowerCase();
  const who = (to: string[]) => [owner, author, checker, viewer].find((p) => to.map((t) => t.toLowerCase()).includes(email(p)))?.name ?? to.join(", ");
  return rows.map((r) => [who(r.to), r.subject.split(": ").pop()!] as [string, string]).sort();
}

describe("a sign-off round tells the people involved", () => {
  it("mails the checkers on submit, the author and owners on check, the author and checker on approval — never the actor", async () => {
    expect((await take(author, "submit")).status).toBe(200);
    await waitForMail(checker.email, { subject: /submitted for checking/ });
    expect((await take(checker, "check")).status).toBe(200);
    await waitForMail(author.email, { subject: /: checked$/ });
    await waitForMail(owner.email, { subject: /: checked$/ });
    expect((await take(owner, "approve")).status).toBe(200);
    await waitForMail(author.email, { subject: /: approved$/ });
    await waitForMail(checker.email, { subject: /: approved$/ });
    // mail is sent after commit, in the background: give a stray one time to show up
    await new Promise((r) => setTimeout(r, 500));
    expect(await mailsAbout()).toEqual(
      [
        [checker.name, "submitted for checking"],
        [author.name, "checked"],
        [owner.name, "checked"],
        [author.name, "approved"],
        [checker.name, "approved"],
      ].sort(),
    );
    const one = await waitForMail(author.email, { subject: /: approved$/ });
    expect(one.text).toContain(`${owner.name} approved version 1`);
    expect(one.text).toContain(`/workspaces/${ws}/sketches/${sketchId}/versions/1`);
  });

  it("puts each step in the sketch's activity feed, with who took it", async () => {
    const feed = await call(activityRoute.GET, { params: { id: sketchId }, cookie: viewer.cookie });
    expect(feed.status).toBe(200);
    const steps = feed.body.events.filter((e: Json) => e.action.startsWith("signoff.")).map((e: Json) => [e.action, e.actorName ?? e.actorEmail]);
    // newest first
    expect(steps).toEqual([
      ["signoff.approve", owner.name],
      ["signoff.check", checker.name],
      ["signoff.submit", author.name],
    ]);
  });

  it("a return mails its author the checker's note; a withdrawal mails the author and checker the reason; a checker with mail off hears of nothing", async () => {
    const team = await makeTeam("Quiet bay", { lead: "owner", drafter: "editor", checker: "checker", quiet: "checker" }, { prefix: "notice-q" });
    await db.update(user).set({ emailNotifications: false }).where(eq(user.id, team.quiet.id));
    const title2 = `Returned skid ${Date.now()}`;
    const id = await postSketch(team.ws, team.drafter, title2, "pipe-bend-anchor");
    const before = (await db.select({ id: devMail.id }).from(devMail).orderBy(devMail.id)).at(-1)?.id ?? 0;
    const step = (who: Person, s: string, note?: string) => call(signoffRoute.POST, { method: "POST", params: { id, number: "1" }, cookie: who.cookie, body: { step: s, ...(note ? { note } : {}) } });
    expect((await step(team.drafter, "submit")).status).toBe(200);
    expect((await step(team.checker, "return", "The anchor's moment arm is taken to the wrong face.")).status).toBe(200);
    const returned = await waitForMail(team.drafter.email, { subject: /: returned with comments$/, after: before });
    expect(returned.subject).toBe(`v1 of "${title2}": returned with comments`);
    expect(returned.text).toContain(`${team.checker.name} returned version 1 of "${title2}".`);
    expect(returned.text).toContain(`"The anchor's moment arm is taken to the wrong face."`);
    expect(returned.text).toContain("Answer the comments, save a new version and submit it again.");
    for (const [who, s] of [[team.drafter, "submit"], [team.checker, "check"], [team.lead, "approve"]] as const) expect((await step(who, s)).status).toBe(200);
    expect((await step(team.lead, "withdraw", "The site changed the pump to a larger one.")).status).toBe(200);
    const toDrafter = await waitForMail(team.drafter.email, { subject: /: approval withdrawn$/, after: before });
    await waitForMail(team.checker.email, { subject: /: approval withdrawn$/, after: before });
    expect(toDrafter.text).toContain(`"The site changed the pump to a larger one."`);
    await new Promise((r) => setTimeout(r, 500));
    const rows = (await db.select().from(devMail).where(like(devMail.subject, `%${title2}%`))).filter((m) => m.id > before);
    const name = (to: string[]) => Object.entries(team).find(([, p]) => typeof p !== "string" && to.includes(p.email.toLowerCase()))?.[0] ?? to.join(", ");
    expect(rows.map((m) => `${name(m.to)}: ${m.subject.split(": ").pop()}`).sort()).toEqual(
      [
        "checker: submitted for checking", // the first submit; the quiet checker gets neither
        "drafter: returned with comments",
        "checker: submitted for checking",
        "drafter: checked",
        "lead: checked",
        "drafter: approved",
        "checker: approved",
        "drafter: approval withdrawn",
        "checker: approval withdrawn", // the lead who approved withdrew it: not mailed
      ].sort(),
    );
  });

  it("the listing and the sketch name the approved version, and drop it once the approval is withdrawn", async () => {
    const listed = async () => (await call(sketchesRoute.GET, { params: { id: ws }, cookie: viewer.cookie })).body.items.find((s: Json) => s.id === sketchId);
    expect((await listed()).approvedVersion).toBe(1);
    expect((await call(sketchRoute.GET, { params: { id: sketchId }, cookie: viewer.cookie })).body.sketch.approvedVersion).toBe(1);
    expect((await take(owner, "withdraw", "Wrong flow rate used.")).status).toBe(200);
    expect((await listed()).approvedVersion).toBeNull();
  });
});
