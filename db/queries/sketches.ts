import "server-only";
import { and, asc, count, desc, eq, ilike, isNotNull, or, sql, type SQL } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import { db } from "@/db";
import { auditEvent, membership, sketch, sketchVersion, user, workspace, type LowFactor, type SolveSummary } from "@/db/schema";
import type { Role } from "@/lib/roles";
import type { ReviewState } from "@/lib/review/rules";
import type { ListSketchesQuery, SketchStatus } from "@/lib/sketch-schemas";
import type { DbOrTx } from "./tx";
import { wasMemberOfDeleted } from "./workspace-deletion";
import { actorMay } from "./workspaces";

const updater = alias(user, "updater");
const creator = alias(user, "creator");
const latest = alias(sketchVersion, "latest");
const origin = alias(sketchVersion, "origin");
const originSketch = alias(sketch, "origin_sketch");

/** A sketch and the caller's role in its workspace (null role: not a member). Null when no such sketch. */
export async function getSketchAccess(sketchId: string, userId: string, tx: DbOrTx = db) {
  const [row] = await tx
    .select({ id: sketch.id, workspaceId: sketch.workspaceId, title: sketch.title, description: sketch.description, tags: sketch.tags, latestVersion: sketch.latestVersion, role: membership.role })
    .from(sketch)
    .leftJoin(membership, and(eq(membership.workspaceId, sketch.workspaceId), eq(membership.userId, userId)))
    .where(eq(sketch.id, sketchId));
  return row ?? null;
}

/**
 * Hold the member's row for the rest of the transaction (FOR SHARE) and return their role: an
 * insert that follows cannot outlive a removal or role change that races it.
 */
export async function lockRole(tx: DbOrTx, workspaceId: string, userId: string): Promise<Role | null> {
  const [row] = await tx
    .select({ role: membership.role })
    .from(membership)
    .where(and(eq(membership.workspaceId, workspaceId), eq(membership.userId, userId)))
    .for("share");
  return row?.role ?? null;
}

/** `LIKE` pattern for a literal substring. */
function containing(text: string): string {
  return `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

/** Worst last: a body that holds but slips at a friction contact ranks between holds and lifts,
 *  as the list shows it ("slips") and filters it (under "slips", not under "holds"). */
const STATUS_RANK = sql`case when ${latest.status} = 'holds' and jsonb_exists(${latest.summary} -> 'warnings', 'SLIP') then 2 else array_position(array['holds','slips','lifts','tips','unrestrained']::text[], ${latest.status}) end`;

export type SketchListItem = {
  id: string;
  title: string;
  tags: string[];
  latestVersion: number;
  status: SketchStatus | null;
  largestReaction: number | null;
  warnings: string[];
  /** a factor of safety below its required value, the furthest below (as drawn, or a case) */
  lowestFactor: LowFactor | null;
  latestMessage: string;
  updatedAt: Date;
  updatedBy: { id: string; name: string } | null;
  forked: boolean;
  /** the newest approved version, if any */
  approvedVersion: number | null;
  /** the latest version's place in the sign-off (submitted, returned, checked…) */
  latestReviewState: ReviewState;
};

export type SketchListPage = { items: SketchListItem[]; total: number; page: number; pageSize: number };

/**
 * A workspace's sketches with their latest version's status, filtered by text (title,
 * description, tags), tag and status, sorted, one page at a time. Empty unless the viewer may read.
 */
export async function listSketches(workspaceId: string, viewerId: string, q: ListSketchesQuery = {}): Promise<SketchListPage> {
  const page = q.page ?? 1;
  const pageSize = q.pageSize ?? 25;
  const where = and(
    eq(sketch.workspaceId, workspaceId),
    actorMay(workspaceId, viewerId, "sketch.read"),
    q.q
      ? or(ilike(sketch.title, containing(q.q)), ilike(sketch.description, containing(q.q)), sql`exists (select 1 from unnest(${sketch.tags}) t where t ilike ${containing(q.q)})`)
      : undefined,
    q.tag ? sql`${sketch.tags} @> array[${q.tag}]::text[]` : undefined,
    q.status === "slips"
      ? sql`jsonb_exists(${latest.summary} -> 'warnings', 'SLIP')`
      : q.status === "holds"
        ? sql`${latest.status} = 'holds' and not jsonb_exists(${latest.summary} -> 'warnings', 'SLIP')`
        : q.status
          ? eq(latest.status, q.status)
          : undefined,
  );
  const dir = q.dir ?? (q.sort === "title" ? "asc" : q.sort === "status" ? "desc" : "desc");
  const by = (c: SQL | typeof sketch.title) => (dir === "asc" ? sql`${c} asc nulls last` : sql`${c} desc nulls last`);
  const order: SQL[] =
    q.sort === "title"
      ? [by(sql`lower(${sketch.title})`)]
      : q.sort === "status"
        ? [by(STATUS_RANK), desc(sketch.updatedAt)]
        : q.sort === "created"
          ? [by(sql`${sketch.createdAt}`)]
          : [by(sql`${sketch.updatedAt}`)];

  const base = db
    .select({
      id: sketch.id,
      title: sketch.title,
      tags: sketch.tags,
      latestVersion: sketch.latestVersion,
      status: latest.status,
      largestReaction: latest.largestReaction,
      summary: latest.summary,
      latestMessage: latest.message,
      latestReviewState: latest.reviewState,
      updatedAt: sketch.updatedAt,
      updaterId: updater.id,
      updaterName: updater.name,
      forkedFrom: sketch.forkedFromVersionId,
      forkedFromTitle: sketch.forkedFromTitle,
      approvedVersion: sql<number | null>`(select max(av.number) from sketch_version av where av.sketch_id = ${sketch.id} and av.review_state = 'approved')`,
    })
    .from(sketch)
    .leftJoin(latest, and(eq(latest.sketchId, sketch.id), eq(latest.number, sketch.latestVersion)))
    .leftJoin(updater, eq(updater.id, sketch.updatedBy))
    .where(where);
  const [rows, [{ n }]] = await Promise.all([
    base.orderBy(...order, asc(sketch.id)).limit(pageSize).offset((page - 1) * pageSize),
    db
      .select({ n: count() })
      .from(sketch)
      .leftJoin(latest, and(eq(latest.sketchId, sketch.id), eq(latest.number, sketch.latestVersion)))
      .where(where),
  ]);
  return {
    page,
    pageSize,
    total: Number(n),
    items: rows.map((r) => ({
      id: r.id,
      title: r.title,
      tags: r.tags,
      latestVersion: r.latestVersion,
      status: (r.status ?? null) as SketchStatus | null,
      largestReaction: r.largestReaction,
      warnings: (r.summary as SolveSummary | null)?.warnings ?? [],
      lowestFactor: (r.summary as SolveSummary | null)?.lowestFactor ?? null,
      latestMessage: r.latestMessage ?? "",
      updatedAt: r.updatedAt,
      updatedBy: r.updaterId ? { id: r.updaterId, name: r.updaterName ?? "" } : null,
      // a fork stays one when its origin is deleted (the link goes, the copied title stays)
      forked: r.forkedFrom !== null || r.forkedFromTitle !== null,
      approvedVersion: r.approvedVersion === null ? null : Number(r.approvedVersion),
      latestReviewState: (r.latestReviewState ?? "draft") as ReviewState,
    })),
  };
}

/** Every tag used in a workspace, for the filter (empty unless the viewer may read). */
export async function listWorkspaceTags(workspaceId: string, viewerId: string): Promise<string[]> {
  const rows = await db
    .selectDistinct({ tag: sql<string>`unnest(${sketch.tags})` })
    .from(sketch)
    .where(and(eq(sketch.workspaceId, workspaceId), actorMay(workspaceId, viewerId, "sketch.read")));
  return rows.map((r) => r.tag).sort();
}

export type ForkOrigin =
  | { visible: true; sketchId: string; title: string; workspaceId: string; versionNumber: number }
  | { visible: false; title: string | null; versionNumber: number }
  /** the origin was deleted since: its title as copied when forked, its version from the fork's own audit record (null if none) */
  | { visible: false; deleted: true; title: string | null; versionNumber: number | null };

/**
 * The version a sketch was forked from, as its own `sketch.fork` record wrote it (the record on
 * the fork, not the one on an origin it was later forked from): it outlives the origin, whose
 * version row goes when the origin is deleted.
 */
const forkRecordVersion = sql<number | null>`(select (a.detail ->> 'fromVersion')::int from ${auditEvent} a
  where a.target_type = 'sketch' and a.target_id = ${sketch.id}::text and a.action = 'sketch.fork' and not jsonb_exists(a.detail, 'origin')
  order by a.id limit 1)`;

/** One sketch as a member sees it, with where it was forked from (named only when the viewer may read the origin). */
export async function getSketchForMember(sketchId: string, viewerId: string) {
  const [row] = await db
    .select({
      id: sketch.id,
      workspaceId: sketch.workspaceId,
      workspaceName: workspace.name,
      title: sketch.title,
      description: sketch.description,
      tags: sketch.tags,
      latestVersion: sketch.latestVersion,
      createdAt: sketch.createdAt,
      createdBy: creator.name,
      updatedAt: sketch.updatedAt,
      updatedBy: updater.name,
      role: membership.role,
      originNumber: origin.number,
      forkedFromTitle: sketch.forkedFromTitle,
      forkRecordVersion: sql<number | null>`case when ${sketch.forkedFromVersionId} is null and ${sketch.forkedFromTitle} is not null then ${forkRecordVersion} end`,
      originSketchId: originSketch.id,
      originTitle: originSketch.title,
      originWorkspaceId: originSketch.workspaceId,
      originVisible: sql<boolean>`${actorMay(originSketch.workspaceId, viewerId, "sketch.read")}`,
      approvedVersion: sql<number | null>`(select max(av.number) from sketch_version av where av.sketch_id = ${sketch.id} and av.review_state = 'approved')`,
    })
    .from(sketch)
    .innerJoin(workspace, eq(workspace.id, sketch.workspaceId))
    .innerJoin(membership, and(eq(membership.workspaceId, sketch.workspaceId), eq(membership.userId, viewerId)))
    .leftJoin(creator, eq(creator.id, sketch.createdBy))
    .leftJoin(updater, eq(updater.id, sketch.updatedBy))
    .leftJoin(origin, eq(origin.id, sketch.forkedFromVersionId))
    .leftJoin(originSketch, eq(originSketch.id, origin.sketchId))
    .where(and(eq(sketch.id, sketchId), actorMay(sketch.workspaceId, viewerId, "sketch.read")));
  if (!row) return null;
  const forkedFrom: ForkOrigin | null =
    row.originNumber === null
      ? row.forkedFromTitle === null
        ? null
        : { visible: false, deleted: true, title: row.forkedFromTitle, versionNumber: row.forkRecordVersion === null ? null : Number(row.forkRecordVersion) }
      : row.originVisible && row.originSketchId && row.originTitle && row.originWorkspaceId
        ? { visible: true, sketchId: row.originSketchId, title: row.originTitle, workspaceId: row.originWorkspaceId, versionNumber: row.originNumber }
        : { visible: false, title: row.forkedFromTitle, versionNumber: row.originNumber };
  return {
    id: row.id,
    workspaceId: row.workspaceId,
    workspaceName: row.workspaceName,
    title: row.title,
    description: row.description,
    tags: row.tags,
    latestVersion: row.latestVersion,
    createdAt: row.createdAt,
    createdBy: row.createdBy,
    updatedAt: row.updatedAt,
    updatedBy: row.updatedBy,
    role: row.role,
    forkedFrom,
    approvedVersion: row.approvedVersion === null ? null : Number(row.approvedVersion),
  };
}
export type SketchDetail = NonNullable<Awaited<ReturnType<typeof getSketchForMember>>>;

/** Rename, describe or re-tag (editors and owners; the role is checked in the UPDATE). */
export async function updateSketch(
  input: { sketchId: string; actorId: string; title?: string; description?: string; tags?: string[] },
  tx: DbOrTx = db,
) {
  const [row] = await tx
    .update(sketch)
    .set({
      ...(input.title !== undefined ? { title: input.title } : {}),
      ...(input.description !== undefined ? { description: input.description } : {}),
      ...(input.tags !== undefined ? { tags: input.tags } : {}),
      updatedAt: new Date(),
      updatedBy: input.actorId,
    })
    .where(and(eq(sketch.id, input.sketchId), actorMay(sketch.workspaceId, input.actorId, "sketch.edit")))
    .returning({ id: sketch.id, title: sketch.title, description: sketch.description, tags: sketch.tags, workspaceId: sketch.workspaceId });
  return row ?? null;
}

/** `withWorkspace`: deleted as part of deleting its workspace. */
export type SketchDeletion = { title: string; deletedBy: string | null; deletedAt: Date; workspaceId: string; withWorkspace?: boolean };

/**
 * Who deleted a sketch and when, from its `sketch.delete` audit record, for a reader who is a member
 * of the workspace it was in (null for anyone else, and for a sketch never deleted): a link to it
 * can then say what happened instead of "no such sketch".
 */
export async function getSketchDeletion(sketchId: string, viewerId: string): Promise<SketchDeletion | null> {
  const [row] = await db
    .select({
      title: sql<string | null>`${auditEvent.detail} ->> 'title'`,
      at: auditEvent.at,
      workspaceId: auditEvent.workspaceId,
      name: user.name,
      email: auditEvent.actorEmail,
      withWorkspace: sql<boolean>`coalesce((${auditEvent.detail} ->> 'withWorkspace')::boolean, false)`,
    })
    .from(auditEvent)
    .leftJoin(membership, and(eq(membership.workspaceId, auditEvent.workspaceId), eq(membership.userId, viewerId)))
    .leftJoin(user, eq(user.id, auditEvent.actorId))
    .where(
      and(
        eq(auditEvent.targetType, "sketch"),
        eq(auditEvent.targetId, sketchId),
        eq(auditEvent.action, "sketch.delete"),
        // a member of its workspace, or (the workspace deleted with it) a member of it then
        or(isNotNull(membership.userId), wasMemberOfDeleted(auditEvent.workspaceId, viewerId)),
      ),
    )
    .orderBy(desc(auditEvent.id))
    .limit(1);
  if (!row || !row.workspaceId) return null;
  return { title: row.title ?? "The sketch", deletedBy: row.name ?? row.email ?? null, deletedAt: row.at, workspaceId: row.workspaceId, ...(row.withWorkspace ? { withWorkspace: true } : {}) };
}

/** Delete a sketch and its versions (owners; checked in the DELETE). Forks of it keep their copy. */
export async function deleteSketch(input: { sketchId: string; actorId: string }, tx: DbOrTx = db) {
  const [row] = await tx
    .delete(sketch)
    .where(and(eq(sketch.id, input.sketchId), actorMay(sketch.workspaceId, input.actorId, "sketch.delete")))
    .returning({ id: sketch.id, title: sketch.title, workspaceId: sketch.workspaceId, latestVersion: sketch.latestVersion });
  return row ?? null;
}
