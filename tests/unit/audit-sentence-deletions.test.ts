// The audit log's words for a member who left by deleting their account.
import { describe, expect, it } from "vitest";
import { auditSentence, type AuditEntry } from "@/components/workspaces/auditSentence";

const entry = (action: string, detail: Record<string, unknown>): AuditEntry => ({ id: 1, at: "2026-12-05T10:00:00Z", action, actorName: "former member: Eddie Drafter", actorEmail: "eddie@example.com", targetType: "user", targetId: "u1", targetName: null, detail });

describe("audit sentences of leaving", () => {
  it("says a member left by deleting their account", () => {
    expect(auditSentence(entry("member.leave", { email: "eddie@example.com", role: "editor", accountDeleted: true }))).toBe("left the workspace: they deleted their account");
  });
  it("says a plain leave as before", () => {
    expect(auditSentence(entry("member.leave", { email: "eddie@example.com", role: "editor" }))).toBe("left the workspace");
  });
});
