// The whole database schema: tables (one file per area under db/tables), then relations, then types.
import { relations } from "drizzle-orm";
import { account, session, user } from "./tables/auth";
import { auditEvent } from "./tables/audit";
import { invitation, membership, workspace } from "./tables/workspaces";
import { sketch, sketchVersion } from "./tables/sketches";
import { comment, signOff } from "./tables/review";
import { upload } from "./tables/uploads";

export * from "./tables/auth";
export * from "./tables/workspaces";
export * from "./tables/audit";
export * from "./tables/dev-mail";
export * from "./tables/sketches";
export * from "./tables/review-enums";
export * from "./tables/review";
export * from "./tables/uploads";
export * from "./tables/rate-limits";

export const userRelations = relations(user, ({ many }) => ({
  sessions: many(session),
  accounts: many(account),
  memberships: many(membership),
}));

export const sessionRelations = relations(session, ({ one }) => ({
  user: one(user, { fields: [session.userId], references: [user.id] }),
}));

export const accountRelations = relations(account, ({ one }) => ({
  user: one(user, { fields: [account.userId], references: [user.id] }),
}));

export const workspaceRelations = relations(workspace, ({ many }) => ({
  memberships: many(membership),
  invitations: many(invitation),
  auditEvents: many(auditEvent),
}));

export const membershipRelations = relations(membership, ({ one }) => ({
  workspace: one(workspace, { fields: [membership.workspaceId], references: [workspace.id] }),
  user: one(user, { fields: [membership.userId], references: [user.id] }),
}));

export const invitationRelations = relations(invitation, ({ one }) => ({
  workspace: one(workspace, { fields: [invitation.workspaceId], references: [workspace.id] }),
  inviter: one(user, { fields: [invitation.invitedBy], references: [user.id] }),
}));

export const auditEventRelations = relations(auditEvent, ({ one }) => ({
  workspace: one(workspace, { fields: [auditEvent.workspaceId], references: [workspace.id] }),
  actor: one(user, { fields: [auditEvent.actorId], references: [user.id] }),
}));

export const sketchRelations = relations(sketch, ({ one, many }) => ({
  workspace: one(workspace, { fields: [sketch.workspaceId], references: [workspace.id] }),
  versions: many(sketchVersion),
}));

export const sketchVersionRelations = relations(sketchVersion, ({ one, many }) => ({
  sketch: one(sketch, { fields: [sketchVersion.sketchId], references: [sketch.id] }),
  author: one(user, { fields: [sketchVersion.authorId], references: [user.id] }),
  signOffs: many(signOff),
  comments: many(comment),
}));

export const signOffRelations = relations(signOff, ({ one }) => ({
  version: one(sketchVersion, { fields: [signOff.versionId], references: [sketchVersion.id] }),
}));

export const commentRelations = relations(comment, ({ one, many }) => ({
  version: one(sketchVersion, { fields: [comment.versionId], references: [sketchVersion.id] }),
  author: one(user, { fields: [comment.authorId], references: [user.id] }),
  attachments: many(upload),
}));

export const uploadRelations = relations(upload, ({ one }) => ({
  workspace: one(workspace, { fields: [upload.workspaceId], references: [workspace.id] }),
  uploader: one(user, { fields: [upload.uploadedBy], references: [user.id] }),
  comment: one(comment, { fields: [upload.commentId], references: [comment.id] }),
}));

export type User = typeof user.$inferSelect;
export type Workspace = typeof workspace.$inferSelect;
export type Membership = typeof membership.$inferSelect;
export type Invitation = typeof invitation.$inferSelect;
export type AuditEvent = typeof auditEvent.$inferSelect;
export type Sketch = typeof sketch.$inferSelect;
export type SketchVersion = typeof sketchVersion.$inferSelect;
export type SignOff = typeof signOff.$inferSelect;
export type Comment = typeof comment.$inferSelect;
export type Upload = typeof upload.$inferSelect;
