import "server-only";
import { and, desc, eq, getTableColumns } from "drizzle-orm";
import { db } from "@/db";
import { sketch, sketchVersion, user, type SolveSummary } from "@/db/schema";
import type { ReviewState } from "@/lib/review/rules";
import type { SketchStatus } from "@/lib/sketch-schemas";
import type { SketchFile } from "@/solver/schema";
import type { DbOrTx } from "./tx";
import { actorMay } from "./workspaces";

export type VersionListItem = {
  id: string;
  number: number;
  message: string;
  authorId: string | null;
  authorName: string | null;
  createdAt: Date;
  status: SketchStatus | null;
  largestReaction: number | null;
  warnings: string[];
  formatVersion: number;
  /** where the version stands in the sign-off */
  reviewState: ReviewState;
};

const listColumns = {
  id: sketchVersion.id,
  number: sketchVersion.number,
  message: sketchVersion.message,
  authorId: sketchVersion.authorId,
  authorName: user.name,
  createdAt: sketchVersion.createdAt,
  status: sketchVersion.status,
  largestReaction: sketchVersion.largestReaction,
  summary: sketchVersion.summary,
  formatVersion: sketchVersion.formatVersion,
  reviewState: sketchVersion.reviewState,
};

type ListRow = { summary: SolveSummary; status: SolveSummary["status"] } & Omit<VersionListItem, "warnings" | "status">;

function toItem({ summary, ...r }: ListRow): VersionListItem {
  return { ...r, status: r.status ?? null, warnings: summary?.warnings ?? [] };
}

/** Every version of a sketch, newest first (empty unless the viewer may read the sketch). */
export async function listVersions(sketchId: string, viewerId: string): Promise<VersionListItem[]> {
  const rows = await db
    .select(listColumns)
    .from(sketchVersion)
    .innerJoin(sketch, eq(sketch.id, sketchVersion.sketchId))
    .leftJoin(user, eq(user.id, sketchVersion.authorId))
    .where(and(eq(sketchVersion.sketchId, sketchId), actorMay(sketch.workspaceId, viewerId, "sketch.read")))
    .orderBy(desc(sketchVersion.number));
  return rows.map(toItem);
}

export type VersionDetail = VersionListItem & { sketchId: string; document: SketchFile; summary: SolveSummary };

/** One version with its document, by sketch and number (null for anyone who may not read it). */
export async function getVersion(sketchId: string, number: number, viewerId: string, tx: DbOrTx = db): Promise<VersionDetail | null> {
  const [row] = await tx
    .select({ ...listColumns, sketchId: sketchVersion.sketchId, document: sketchVersion.document })
    .from(sketchVersion)
    .innerJoin(sketch, eq(sketch.id, sketchVersion.sketchId))
    .leftJoin(user, eq(user.id, sketchVersion.authorId))
    .where(and(eq(sketchVersion.sketchId, sketchId), eq(sketchVersion.number, number), actorMay(sketch.workspaceId, viewerId, "sketch.read")));
  return row ? { ...toItem(row), sketchId: row.sketchId, document: row.document, summary: row.summary } : null;
}

/** The same by the version's id. */
export async function getVersionById(versionId: string, viewerId: string, tx: DbOrTx = db): Promise<(VersionDetail & { workspaceId: string }) | null> {
  const [row] = await tx
    .select({ ...listColumns, sketchId: sketchVersion.sketchId, document: sketchVersion.document, workspaceId: sketch.workspaceId })
    .from(sketchVersion)
    .innerJoin(sketch, eq(sketch.id, sketchVersion.sketchId))
    .leftJoin(user, eq(user.id, sketchVersion.authorId))
    .where(and(eq(sketchVersion.id, versionId), actorMay(sketch.workspaceId, viewerId, "sketch.read")));
  return row ? { ...toItem(row), sketchId: row.sketchId, document: row.document, summary: row.summary, workspaceId: row.workspaceId } : null;
}

export type NewVersion = { document: SketchFile; formatVersion: number; summary: SolveSummary; message: string };

/** Insert version `number` of a sketch (the caller holds the sketch row's lock). */
export async function insertVersion(tx: DbOrTx, input: NewVersion & { sketchId: string; number: number; authorId: string }) {
  const [row] = await tx
    .insert(sketchVersion)
    .values({
      sketchId: input.sketchId,
      number: input.number,
      message: input.message,
      document: input.document,
      formatVersion: input.formatVersion,
      status: input.summary.status,
      largestReaction: input.summary.largestReaction,
      summary: input.summary,
      authorId: input.authorId,
    })
    .returning({ id: sketchVersion.id, number: sketchVersion.number, createdAt: sketchVersion.createdAt });
  return row;
}

export type SaveOutcome =
  | { ok: true; version: { id: string; number: number; createdAt: Date }; workspaceId: string; title: string; renamedFrom?: string }
  | { ok: false; reason: "conflict"; latest: VersionListItem }
  | { ok: false; reason: "forbidden" };

/**
 * Save the next version on top of `baseVersion`. The sketch row is locked (FOR UPDATE) with the
 * role check in the same WHERE, so of several saves on one base exactly one wins; the others
 * find a newer latest version and get it back as a conflict.
 */
export async function saveNextVersion(tx: DbOrTx, input: NewVersion & { sketchId: string; actorId: string; baseVersion: number }): Promise<SaveOutcome> {
  const [s] = await tx
    .select({ id: sketch.id, latestVersion: sketch.latestVersion, workspaceId: sketch.workspaceId, title: sketch.title })
    .from(sketch)
    .where(and(eq(sketch.id, input.sketchId), actorMay(sketch.workspaceId, input.actorId, "version.save")))
    .for("update", { of: sketch });
  if (!s) return { ok: false, reason: "forbidden" };
  if (s.latestVersion !== input.baseVersion) {
    const [latest] = await tx
      .select(listColumns)
      .from(sketchVersion)
      .leftJoin(user, eq(user.id, sketchVersion.authorId))
      .where(and(eq(sketchVersion.sketchId, s.id), eq(sketchVersion.number, s.latestVersion)));
    return { ok: false, reason: "conflict", latest: toItem(latest) };
  }
  // the drawing's title changed in this version (the editor's Title field): the sketch takes it as
  // its name, so the listings, the version page and the calc sheet call it what the drawing does.
  // Compared with the base version's, so a rename in the details since is not undone by a save.
  const [base] = await tx
    .select({ doc: sketchVersion.document })
    .from(sketchVersion)
    .where(and(eq(sketchVersion.sketchId, s.id), eq(sketchVersion.number, input.baseVersion)));
  const drawn = (input.document.title ?? "").trim().slice(0, 120);
  const rename = drawn !== "" && drawn !== s.title && drawn !== (base?.doc.title ?? "").trim().slice(0, 120);
  const version = await insertVersion(tx, { ...input, number: s.latestVersion + 1, authorId: input.actorId });
  await tx
    .update(sketch)
    .set({ latestVersion: version.number, updatedAt: version.createdAt, updatedBy: input.actorId, ...(rename ? { title: drawn } : {}) })
    .where(eq(sketch.id, s.id));
  return rename ? { ok: true, version, workspaceId: s.workspaceId, title: drawn, renamedFrom: s.title } : { ok: true, version, workspaceId: s.workspaceId, title: s.title };
}

/** A new sketch with its version 1 (the caller checked and locked the role). */
export async function insertSketchWithFirstVersion(
  tx: DbOrTx,
  input: NewVersion & { workspaceId: string; actorId: string; title: string; description?: string; tags?: string[]; forkedFromVersionId?: string | null; forkedFromTitle?: string | null },
) {
  const [s] = await tx
    .insert(sketch)
    .values({
      workspaceId: input.workspaceId,
      title: input.title,
      description: input.description ?? "",
      tags: input.tags ?? [],
      forkedFromVersionId: input.forkedFromVersionId ?? null,
      forkedFromTitle: input.forkedFromTitle ?? null,
      latestVersion: 1,
      createdBy: input.actorId,
      updatedBy: input.actorId,
    })
    .returning(getTableColumns(sketch));
  const version = await insertVersion(tx, { ...input, sketchId: s.id, number: 1, authorId: input.actorId });
  return { sketch: s, version };
}
