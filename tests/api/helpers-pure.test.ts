// The small pure pieces the screens rely on: audit sentences, expiry wording, query keys,
// safe redirects after sign-in, and the role table.
import { describe, expect, it } from "vitest";
import { auditSentence, type AuditEntry } from "@/components/workspaces/auditSentence";
import { formatDateTime, relativeExpiry } from "@/components/workspaces/format";
import { apiKey } from "@/lib/api-client";
import { can, PERMISSIONS, ROLES } from "@/lib/roles";
import { safeNext } from "@/lib/session";

const entry = (action: string, detail: Record<string, unknown> = {}, targetName: string | null = null): AuditEntry => ({
  id: 1,
  at: "2026-03-04T05:06:07Z",
  action,
  actorName: "Olivia Owner",
  actorEmail: "o@x.y",
  targetType: "user",
  targetId: "u1",
  targetName,
  detail,
});

describe("audit sentences", () => {
  it.each([
    [entry("auth.sign_in"), "signed in"],
    [entry("auth.sign_out_all"), "signed out on every device"],
    [entry("auth.sign_out_others"), "signed out every other device"],
    [entry("invitation.create", { email: "c@x.y", role: "checker" }), "invited c@x.y as checker"],
    [entry("invitation.withdraw", { email: "c@x.y" }), "withdrew the invitation of c@x.y"],
    [entry("invitation.accept", { role: "viewer" }), "joined as viewer through an invitation"],
    [entry("member.role_change", { from: "checker", to: "viewer", email: "c@x.y" }, "Chen Checker"), "changed the role of Chen Checker from checker to viewer"],
    [entry("member.role_change", { from: "editor", to: "owner", email: "gone@x.y" }), "changed the role of gone@x.y from editor to owner"],
    [entry("member.remove", { name: "Vera Viewer", role: "viewer" }), "removed Vera Viewer (viewer)"],
    [entry("member.leave"), "left the workspace"],
    [entry("workspace.rename", { name: "Pump House 2" }), 'renamed the workspace to "Pump House 2"'],
    [entry("comment.create", { number: 4, title: "Jet thrust stand", note: "Is the **front pin** grouted? *Check* `mu`" }), 'commented on v4 of "Jet thrust stand": Is the front pin grouted? Check mu'],
    [entry("comment.create", { number: 4, title: "Jet thrust stand", note: "Yes, grouted.", reply: true }), 'replied on v4 of "Jet thrust stand": Yes, grouted.'],
    [entry("signoff.return", { number: 4, title: "Jet thrust stand", note: "Fix the pin" }), 'returned v4 of "Jet thrust stand": Fix the pin'],
    [entry("signoff.submit", { number: 4, title: "Jet thrust stand" }), 'submitted v4 of "Jet thrust stand" for checking'],
    [entry("sketch.future_action"), "sketch.future_action"],
  ])("%#: %s", (e, sentence) => {
    expect(auditSentence(e)).toBe(sentence);
  });
});

describe("dates and expiry", () => {
  it("formats in UTC and words the time left", () => {
    expect(formatDateTime("2026-03-04T05:06:07Z")).toBe("4 Mar 2026, 05:06 UTC");
    const now = Date.parse("2026-03-04T00:00:00Z");
    expect(relativeExpiry("2026-03-11T00:00:00Z", now)).toBe("in 7 days");
    expect(relativeExpiry("2026-03-04T05:00:00Z", now)).toBe("in 5 hours");
    expect(relativeExpiry("2026-03-03T23:59:00Z", now)).toBe("expired 1 minute ago");
    expect(relativeExpiry("2026-03-02T00:00:00Z", now)).toBe("expired 2 days ago");
  });
});

describe("query keys and redirects", () => {
  it("mirrors the API path in the query key", () => {
    expect(apiKey("/api/workspaces/abc/members?x=1")).toEqual(["api", "workspaces", "abc", "members"]);
  });

  it("follows only same-site paths after sign-in", () => {
    expect(safeNext("/invite/tok")).toBe("/invite/tok");
    expect(safeNext("//evil.example/x")).toBe("/workspaces");
    expect(safeNext("/\\evil.example")).toBe("/workspaces");
    expect(safeNext("https://evil.example")).toBe("/workspaces");
    expect(safeNext(undefined)).toBe("/workspaces");
  });
});

describe("role table", () => {
  it("gives owners every permission and viewers only reading", () => {
    for (const p of Object.keys(PERMISSIONS) as (keyof typeof PERMISSIONS)[]) expect(can("owner", p)).toBe(true);
    const viewer = (Object.keys(PERMISSIONS) as (keyof typeof PERMISSIONS)[]).filter((p) => can("viewer", p));
    expect(viewer.sort()).toEqual(["members.list", "sketch.read", "upload.read", "workspace.read"]);
    expect(can("checker", "version.check")).toBe(true);
    expect(can("editor", "version.check")).toBe(false);
    expect(can(null, "workspace.read")).toBe(false);
    expect(ROLES).toEqual(["owner", "editor", "checker", "viewer"]);
  });
});
