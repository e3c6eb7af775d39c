// The audit log's actions and how each reads on the owners' audit page. Browser-safe.
// Later work (sketches, versions, review) adds its actions here.

export const AUDIT_ACTIONS = {
  "auth.sign_in": "signed in",
  "auth.password_reset": "reset their password",
  "auth.email_change": "changed their sign-in address",
  "auth.account_delete": "deleted their account",
  "auth.sign_out": "signed out",
  "auth.sign_out_all": "signed out on every device",
  "auth.sign_out_others": "signed out every other device",
  "auth.password_change": "changed their password",
  "workspace.create": "created the workspace",
  "workspace.rename": "renamed the workspace",
  "workspace.delete": "deleted the workspace",
  "workspace.export": "exported the sketches of the workspace",
  "invitation.create": "invited",
  "invitation.withdraw": "withdrew the invitation of",
  "invitation.accept": "joined through an invitation",
  "member.role_change": "changed the role of",
  "member.remove": "removed",
  "member.leave": "left the workspace",
  "sketch.create": "created the sketch",
  "sketch.save": "saved a version of",
  "sketch.fork": "forked",
  "sketch.rename": "renamed the sketch",
  "sketch.edit": "edited the details of",
  "sketch.delete": "deleted the sketch",
  "comment.create": "commented on",
  "comment.edit": "edited a comment on",
  "comment.delete": "deleted a comment on",
  "comment.resolve": "resolved a comment on",
  "comment.reopen": "reopened a comment on",
  "signoff.submit": "submitted for checking",
  "signoff.check": "checked",
  "signoff.return": "returned",
  "signoff.approve": "approved",
  "signoff.withdraw": "withdrew the approval of",
  "upload.create": "uploaded a file to",
  "upload.delete": "deleted an uploaded file from",
} as const;

export type AuditAction = keyof typeof AUDIT_ACTIONS;

export function auditActionLabel(action: string): string {
  return (AUDIT_ACTIONS as Record<string, string>)[action] ?? action;
}
