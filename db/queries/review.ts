import "server-only";
import { and, asc, desc, eq, gt, lt, sql } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import { db } from "@/db";
import { auditEvent, comment, membership, signOff, sketch, sketchVersion, user, workspace } from "@/db/schema";
import { STATE_WORDS, type ReviewState, type SignOffStep } from "@/lib/review/rules";
import type { SketchFile } from "@/solver/schema";
import type { DbOrTx } from "./tx";
import { withoutHiddenDetail } from "./audit";
import { actorMay } from "./workspaces";

const actorUser = alias(user, "actor_user");
const author = alias(user, "author");

/**
 * A version, its sketch and the caller's role, by sketch id and number (null when either does
 * not exist; `role` null when the caller is not a member). `lock`: hold the version row for the
 * transaction (a sign-off step or a comment checks the state and writes under that lock).
 */
export async function getVersionAccess(sketchId: string, number: number, userId: string, tx: DbOrTx = db, lock = false) {
  const q = tx
    .select({
      versionId: sketchVersion.id,
      number: sketchVersion.number,
      authorId: sketchVersion.authorId,
      checkedBy: sketchVersion.checkedBy,
      reviewState: sketchVersion.reviewState,
      createdAt: sketchVersion.createdAt,
      sketchId: sketch.id,
      sketchTitle: sketch.title,
      latestVersion: sketch.latestVersion,
      workspaceId: sketch.workspaceId,
      role: membership.role,
    })
    .from(sketchVersion)
    .innerJoin(sketch, eq(sketch.id, sketchVersion.sketchId))
    .leftJoin(membership, and(eq(membership.workspaceId, sketch.workspaceId), eq(membership.userId, userId)))
    .where(and(eq(sketchVersion.sketchId, sketchId), eq(sketchVersion.number, number)));
  const [row] = lock ? await q.for("update", { of: sketchVersion }) : await q;
  return row ?? null;
}
export type VersionAccess = NonNullable<Awaited<ReturnType<typeof getVersionAccess>>>;

/**
 * Move a version from `from` to `to` and append the step to its record. The UPDATE names the
 * state it expects and the actor's role check, so a race or a removed member changes nothing.
 */
export async function applySignOff(
  tx: DbOrTx,
  input: { versionId: string; workspaceId: string; step: SignOffStep; from: ReviewState; to: ReviewState; actor: { id: string; name: string }; note: string },
) {
  const checkedBy = input.step === "check" ? input.actor.id : input.step === "submit" || input.step === "return" ? null : undefined;
  const [moved] = await tx
    .update(sketchVersion)
    .set({ reviewState: input.to, ...(checkedBy !== undefined ? { checkedBy } : {}) })
    .where(
      and(
        eq(sketchVersion.id, input.versionId),
        eq(sketchVersion.reviewState, input.from),
        sql`exists (select 1 from membership m where m.workspace_id = ${input.workspaceId} and m.user_id = ${input.actor.id})`,
      ),
    )
    .returning({ id: sketchVersion.id });
  if (!moved) return null;
  const [entry] = await tx
    .insert(signOff)
    .values({ versionId: input.versionId, step: input.step, fromState: input.from, toState: input.to, actorId: input.actor.id, actorName: input.actor.name, note: input.note })
    .returning();
  return entry;
}

export type SignOffEntry = { id: number; step: SignOffStep; fromState: ReviewState; toState: ReviewState; actorId: string | null; actorName: string; note: string; at: Date };

export async function listSignOffs(versionId: string, tx: DbOrTx = db): Promise<SignOffEntry[]> {
  return tx
    .select({ id: signOff.id, step: signOff.step, fromState: signOff.fromState, toState: signOff.toState, actorId: signOff.actorId, actorName: signOff.actorName, note: signOff.note, at: signOff.at })
    .from(signOff)
    .where(eq(signOff.versionId, versionId))
    .orderBy(asc(signOff.id));
}

export type TitleBlockEntry = { name: string; date: Date };
export type TitleBlock = { prepared: TitleBlockEntry; checked: TitleBlockEntry | null; approved: TitleBlockEntry | null };

/**
 * Prepared / checked / approved of the current round: a new submission starts a round, a return
 * clears the check, a withdrawal clears the approval.
 */
export function titleBlockOf(prepared: TitleBlockEntry, entries: SignOffEntry[]): TitleBlock {
  let checked: TitleBlockEntry | null = null;
  let approved: TitleBlockEntry | null = null;
  for (const e of entries) {
    if (e.step === "submit") {
      checked = null;
      approved = null;
    } else if (e.step === "check") checked = { name: e.actorName, date: e.at };
    else if (e.step === "return") checked = null;
    else if (e.step === "approve") approved = { name: e.actorName, date: e.at };
    else if (e.step === "withdraw") approved = null;
  }
  return { prepared, checked, approved };
}

/** Where the version's review stands, for the title block: "approval withdrawn by …, date: reason" names who and why. */
export function reviewWords(state: ReviewState, entries: SignOffEntry[]): string {
  const last = [...entries].reverse().find((e) => e.toState === state);
  const words = STATE_WORDS[state]?.label ?? state;
  if (!last || state === "draft") return words === "prepared" ? "prepared, not yet submitted for checking" : words;
  const when = last.at.toISOString().slice(0, 10);
  return `${words} by ${last.actorName}, ${when}${(state === "withdrawn" || state === "returned") && last.note ? `: ${last.note}` : ""}`;
}

/**
 * For the calc sheet: a version as its title block needs it — workspace, sketch, number,
 * message, saved date, the document, and the sign-off of the current round (prepared, checked,
 * approved, each with name and date). Null unless the user may read the sketch.
 */
export async function getVersionForCalcSheet(versionId: string, userId: string) {
  const [row] = await db
    .select({
      versionId: sketchVersion.id,
      number: sketchVersion.number,
      message: sketchVersion.message,
      savedAt: sketchVersion.createdAt,
      document: sketchVersion.document,
      reviewState: sketchVersion.reviewState,
      authorName: author.name,
      sketchId: sketch.id,
      sketchTitle: sketch.title,
      latestVersion: sketch.latestVersion,
      workspaceId: workspace.id,
      workspaceName: workspace.name,
    })
    .from(sketchVersion)
    .innerJoin(sketch, eq(sketch.id, sketchVersion.sketchId))
    .innerJoin(workspace, eq(workspace.id, sketch.workspaceId))
    .leftJoin(author, eq(author.id, sketchVersion.authorId))
    .where(and(eq(sketchVersion.id, versionId), actorMay(sketch.workspaceId, userId, "sketch.read")));
  if (!row) return null;
  const entries = await listSignOffs(versionId);
  const block = titleBlockOf({ name: row.authorName ?? "a deleted account", date: row.savedAt }, entries);
  const signOffRows: Array<{ role: "prepared" | "checked" | "approved"; name: string; date: Date }> = [{ role: "prepared", ...block.prepared }];
  if (block.checked) signOffRows.push({ role: "checked", ...block.checked });
  if (block.approved) signOffRows.push({ role: "approved", ...block.approved });
  return {
    versionId: row.versionId,
    workspaceId: row.workspaceId,
    workspaceName: row.workspaceName,
    sketchId: row.sketchId,
    sketchTitle: row.sketchTitle,
    versionNumber: row.number,
    latestVersion: row.latestVersion,
    message: row.message,
    savedAt: row.savedAt,
    authorName: row.authorName,
    reviewState: row.reviewState,
    review: reviewWords(row.reviewState as ReviewState, entries),
    document: row.document as SketchFile,
    signOff: signOffRows,
    /** every sign-off step of the version, in order, for the check record */
    steps: entries,
  };
}
/** The newest version before (or after) `number` that stands approved, null when none. */
async function newestApproved(sketchId: string, number: number, side: "before" | "after"): Promise<number | null> {
  const [row] = await db
    .select({ number: sketchVersion.number })
    .from(sketchVersion)
    .where(and(eq(sketchVersion.sketchId, sketchId), (side === "before" ? lt : gt)(sketchVersion.number, number), eq(sketchVersion.reviewState, "approved")))
    .orderBy(desc(sketchVersion.number))
    .limit(1);
  return row?.number ?? null;
}
/** The newest earlier version that stands approved: a later sheet says it revises it. */
export const approvedBefore = (sketchId: string, number: number) => newestApproved(sketchId, number, "before");
/** The newest later version that stands approved: an approved sheet says whether it still governs. */
export const approvedAfter = (sketchId: string, number: number) => newestApproved(sketchId, number, "after");

export type CalcSheetVersion = NonNullable<Awaited<ReturnType<typeof getVersionForCalcSheet>>>;

export type ActivityRow = { id: number; at: Date; action: string; actorName: string | null; detail: Record<string, unknown> };

/** What happened to a sketch, newest first: saves, forks, renames, comments, sign-off steps (members only). */
export async function listSketchActivity(
  sketchId: string,
  workspaceId: string,
  viewerId: string,
  opts: { before?: number; limit?: number } = {},
): Promise<{ events: ActivityRow[]; nextBefore: number | null }> {
  const limit = Math.min(Math.max(opts.limit ?? 30, 1), 100);
  const rows = await db
    .select({
      id: auditEvent.id,
      at: auditEvent.at,
      action: auditEvent.action,
      actorName: sql<string | null>`coalesce(${actorUser.name}, ${auditEvent.actorEmail})`,
      detail: auditEvent.detail,
      // the comment an event quotes has since been deleted: its words leave the feed with it
      commentDeleted: sql<boolean>`exists (select 1 from ${comment} where ${comment.id}::text = ${auditEvent.detail} ->> 'commentId' and ${comment.deletedAt} is not null)`,
    })
    .from(auditEvent)
    .leftJoin(actorUser, eq(actorUser.id, auditEvent.actorId))
    .where(
      and(
        eq(auditEvent.targetType, "sketch"),
        eq(auditEvent.targetId, sketchId),
        eq(auditEvent.workspaceId, workspaceId),
        opts.before ? lt(auditEvent.id, opts.before) : undefined,
        actorMay(workspaceId, viewerId, "sketch.read"),
      ),
    )
    .orderBy(desc(auditEvent.id))
    .limit(limit + 1);
  const more = rows.length > limit;
  const events = rows.slice(0, limit).map(({ commentDeleted, ...row }) => {
    const shown = withoutHiddenDetail(row);
    if (!commentDeleted || !("note" in shown.detail)) return shown;
    const { note: _deleted, ...detail } = shown.detail;
    return { ...shown, detail };
  });
  return { events, nextBefore: more ? events[events.length - 1].id : null };
}

/** A version in the workspace part-way through its sign-off (submitted, checked or returned), with
 *  its sketch, author, checker and when its state last moved; newest move first. */
export async function listVersionsInReview(workspaceId: string, tx: DbOrTx = db) {
  const since = sql<Date>`coalesce((select max(so.at) from sign_off so where so.version_id = ${sketchVersion.id}), ${sketchVersion.createdAt})`;
  const rows = await tx
    .select({
      sketchId: sketch.id,
      sketchTitle: sketch.title,
      latestVersion: sketch.latestVersion,
      number: sketchVersion.number,
      state: sketchVersion.reviewState,
      authorId: sketchVersion.authorId,
      authorName: author.name,
      checkedBy: sketchVersion.checkedBy,
      since,
    })
    .from(sketchVersion)
    .innerJoin(sketch, eq(sketch.id, sketchVersion.sketchId))
    .leftJoin(author, eq(author.id, sketchVersion.authorId))
    .where(and(eq(sketch.workspaceId, workspaceId), sql`${sketchVersion.reviewState} in ('submitted', 'checked', 'returned', 'withdrawn')`))
    .orderBy(desc(since))
    .limit(500);
  return rows.map((r) => ({ ...r, since: new Date(r.since) }));
}
