import "server-only";
import { db } from "@/db";
import { deletionSentence, forkTitle } from "@/components/sketches/format";
import { deleteSketch, getSketchAccess, getSketchDeletion, getSketchForMember, lockRole, updateSketch } from "@/db/queries/sketches";
import type { DbOrTx } from "@/db/queries/tx";
import { getRole } from "@/db/queries/workspaces";
import { getVersion, insertSketchWithFirstVersion, saveNextVersion, type NewVersion, type VersionListItem } from "@/db/queries/versions";
import { recordAudit } from "./audit";
import { AppError } from "./errors";
import { can, refusedWords, type Permission, type Role } from "./roles";
import { emptySketchFile, summarizeSolve, type ParsedSketch } from "./sketch-document";
import { parseSketch } from "@/solver";
import { deleteObjectsQuietly } from "./uploads/objects";
import { assertUnderlayIn, copyUnderlayForFork, keysOfSketch, type UnderlayCopy } from "./uploads/underlay";

type Actor = { id: string; email: string };

const NO_SKETCH = "No such sketch, or you are not a member of its workspace.";

/**
 * The caller's role on a sketch, for routes that reach the workspace through a sketch id:
 * 404 when the sketch does not exist or the caller is not a member (nothing leaks), 403 when
 * the role lacks the permission.
 */
export async function requireSketchRole(sketchId: string, userId: string, permission: Permission) {
  const access = await getSketchAccess(sketchId, userId);
  if (!access) throw await noSketchError(sketchId, userId);
  if (!access.role) throw new AppError("not_found", NO_SKETCH);
  if (!can(access.role, permission)) throw new AppError("forbidden", refusedWords(access.role, permission));
  return access as typeof access & { role: Role };
}

/**
 * The 404 for a sketch that is not there: to a member of the workspace it was deleted from, who
 * deleted it and when (`error.deleted`); to anyone else, the words of a sketch that never was.
 */
async function noSketchError(sketchId: string, userId: string): Promise<AppError> {
  const gone = await getSketchDeletion(sketchId, userId);
  if (!gone) return new AppError("not_found", NO_SKETCH);
  return new AppError("not_found", deletionSentence(gone), {
    extra: { deleted: { title: gone.title, deletedBy: gone.deletedBy, deletedAt: gone.deletedAt, workspaceId: gone.workspaceId } },
  });
}

/**
 * Why a write whose WHERE clause matched no row found nothing, asked again once it has: the
 * sketch is gone (deleted since the request began) or the caller left the workspace → 404; the
 * role no longer allows it → 403.
 */
export async function accessLostError(sketchId: string, userId: string, permission: Permission, tx: DbOrTx = db): Promise<AppError> {
  const access = await getSketchAccess(sketchId, userId, tx);
  if (!access || !access.role) return new AppError("not_found", NO_SKETCH);
  return can(access.role, permission) ? new AppError("conflict") : new AppError("forbidden", refusedWords(access.role, permission));
}

/** The sketch as GET /api/sketches/:id answers it (also read by the sketch page): the sketch and its latest version's summary. */
export async function readSketch(sketchId: string, userId: string) {
  await requireSketchRole(sketchId, userId, "sketch.read");
  const s = await getSketchForMember(sketchId, userId);
  if (!s) throw new AppError("not_found", NO_SKETCH);
  const latest = await getVersion(sketchId, s.latestVersion, userId);
  if (!latest) return { sketch: s, latest: null };
  const { document: _document, ...summary } = latest;
  return { sketch: s, latest: summary };
}
export type SketchRead = Awaited<ReturnType<typeof readSketch>>;

/** What is stored for a parsed document: the file as validated and migrated, its format version and its solve summary. */
export function versionContent(parsed: ParsedSketch, message: string | undefined): NewVersion {
  return { document: parsed.file, formatVersion: parsed.file.version, summary: summarizeSolve(parsed), message: message ?? "" };
}

function parsedEmpty(title: string): ParsedSketch {
  const parsed = parseSketch(emptySketchFile(title));
  if (!parsed.ok) throw new Error("the empty sketch does not parse");
  return parsed;
}

/** A new sketch with version 1 in a workspace where the actor may create sketches. */
export async function createSketch(
  workspaceId: string,
  actor: Actor,
  input: { title?: string; description?: string; tags?: string[]; message?: string; document?: ParsedSketch },
) {
  const title = input.title ?? (input.document?.file.title?.trim() || "Untitled sketch");
  const parsed = input.document ?? parsedEmpty(title);
  return db.transaction(async (tx) => {
    const role = await lockRole(tx, workspaceId, actor.id);
    if (!role) throw new AppError("not_found", "No such workspace, or you are not a member of it.");
    if (!can(role, "sketch.create")) throw new AppError("forbidden", refusedWords(role, "sketch.create"));
    await assertUnderlayIn(workspaceId, parsed.file, tx);
    const made = await insertSketchWithFirstVersion(tx, {
      ...versionContent(parsed, input.message ?? "First version"),
      workspaceId,
      actorId: actor.id,
      title: title.slice(0, 120),
      description: input.description,
      tags: input.tags,
    });
    await recordAudit(
      { action: "sketch.create", actorId: actor.id, actorEmail: actor.email, workspaceId, targetType: "sketch", targetId: made.sketch.id, detail: { title: made.sketch.title, sketchId: made.sketch.id } },
      tx,
    );
    return made;
  });
}

/**
 * 409 body facts about the version that won (`byYou`: the caller's own save, from another tab or a
 * script); or, for a base version the sketch has never had (a script that counted wrong), a 400
 * naming `baseVersion`: no one saved "since" it.
 */
function conflictError(latest: VersionListItem, base: number, actorId: string): AppError {
  const byYou = latest.authorId === actorId;
  const facts = { number: latest.number, message: latest.message, authorName: latest.authorName, createdAt: latest.createdAt, status: latest.status, byYou };
  if (base > latest.number) {
    return new AppError("validation_failed", `This sketch has no version ${base}: its newest is version ${latest.number}. Save on the version you started from.`, {
      fields: [{ path: "baseVersion", message: `There is no version ${base}; the newest is ${latest.number}.` }],
      extra: { latest: facts },
    });
  }
  const message = byYou
    ? `You saved version ${latest.number} (in another tab or window, or by a script) since version ${base} was opened here. Nothing was overwritten.`
    : `${latest.authorName ? `${latest.authorName} saved` : "Someone saved"} version ${latest.number} since you opened version ${base}. Nothing was overwritten.`;
  return new AppError("version_conflict", message, { extra: { latest: facts } });
}

function isUniqueViolation(err: unknown): boolean {
  const code = (err as { code?: string; cause?: { code?: string } })?.code ?? (err as { cause?: { code?: string } })?.cause?.code;
  return code === "23505";
}

/** Save the next version on top of `baseVersion`; 409 with the latest version when someone saved since. */
export async function saveVersion(sketchId: string, actor: Actor, input: { baseVersion: number; message?: string; document: ParsedSketch; restoredFrom?: number }) {
  const access = await requireSketchRole(sketchId, actor.id, "version.save");
  const content = versionContent(input.document, input.message);
  try {
    return await db.transaction(async (tx) => {
      // inside the transaction: the underlay row stays locked until the version that draws it
      // is stored, so the sweep of unused underlays cannot remove it in between
      await assertUnderlayIn(access.workspaceId, input.document.file, tx);
      const out = await saveNextVersion(tx, { ...content, sketchId, actorId: actor.id, baseVersion: input.baseVersion });
      if (!out.ok && out.reason === "forbidden") throw await accessLostError(sketchId, actor.id, "version.save", tx);
      if (!out.ok) throw conflictError(out.latest, input.baseVersion, actor.id);
      await recordAudit(
        {
          action: "sketch.save",
          actorId: actor.id,
          actorEmail: actor.email,
          workspaceId: out.workspaceId,
          targetType: "sketch",
          targetId: sketchId,
          detail: { sketchId, title: out.title, number: out.version.number, message: content.message, ...(input.restoredFrom ? { restoredFrom: input.restoredFrom } : {}) },
        },
        tx,
      );
      if (out.renamedFrom !== undefined)
        await recordAudit(
          {
            action: "sketch.rename",
            actorId: actor.id,
            actorEmail: actor.email,
            workspaceId: out.workspaceId,
            targetType: "sketch",
            targetId: sketchId,
            detail: { sketchId, title: out.title, from: out.renamedFrom, changed: ["title"], number: out.version.number },
          },
          tx,
        );
      return { ...out.version, message: content.message, status: content.summary.status, largestReaction: content.summary.largestReaction, sketchTitle: out.title };
    });
  } catch (err) {
    if (!isUniqueViolation(err)) throw err;
    // A lost race that slipped past the lock (it cannot with READ COMMITTED, but the unique index is the last word).
    const access = await getSketchAccess(sketchId, actor.id);
    const latest = access ? await getVersion(sketchId, access.latestVersion, actor.id) : null;
    if (!latest) throw new AppError("conflict");
    throw conflictError(latest, input.baseVersion, actor.id);
  }
}

/** The message a restored version is saved with when the caller gives none. */
export function restoredMessage(number: number, message: string | null | undefined): string {
  const said = message?.trim() ? ` — ${message.trim()}` : "";
  return `Restored v${number}${said}`.slice(0, 500);
}

/**
 * Make an older version the latest again: a new version, on top of `baseVersion` (409 when someone
 * saved since), whose drawing is version `number`'s as saved. The sketch keeps its present title
 * (a restore brings back the drawing, not an old name). Nothing is overwritten: the versions in
 * between stay in the history.
 */
export async function restoreVersion(sketchId: string, actor: Actor, input: { number: number; baseVersion: number; message?: string }) {
  const access = await requireSketchRole(sketchId, actor.id, "version.save");
  const old = await getVersion(sketchId, input.number, actor.id);
  if (!old) throw new AppError("not_found", `This sketch has no version ${input.number}.`);
  if (input.number === access.latestVersion)
    throw new AppError("validation_failed", `Version ${input.number} is already the latest: there is nothing to restore.`, {
      fields: [{ path: "number", message: `v${input.number} is the latest version.` }],
    });
  const parsed = parseSketch({ ...(old.document as object), title: access.title });
  if (!parsed.ok) throw new AppError("validation_failed", `Version ${input.number} no longer reads as a sketch: ${parsed.errors[0]?.path} ${parsed.errors[0]?.message}`);
  const message = input.message?.trim() || restoredMessage(input.number, old.message);
  return saveVersion(sketchId, actor, { baseVersion: input.baseVersion, message, document: parsed, restoredFrom: input.number });
}

/**
 * Rename, describe or re-tag a sketch. The log says sketch.rename when the title changed and
 * sketch.edit otherwise, with the fields that were sent in `changed`.
 */
export async function editSketch(sketchId: string, actor: Actor, input: { title?: string; description?: string; tags?: string[] }) {
  const before = await requireSketchRole(sketchId, actor.id, "sketch.edit");
  return db.transaction(async (tx) => {
    const row = await updateSketch({ sketchId, actorId: actor.id, ...input }, tx);
    if (!row) throw await accessLostError(sketchId, actor.id, "sketch.edit", tx);
    const renamed = input.title !== undefined && row.title !== before.title;
    const changed = [...(renamed ? ["title"] : []), ...(input.description !== undefined ? ["description"] : []), ...(input.tags !== undefined ? ["tags"] : [])];
    await recordAudit(
      {
        action: renamed ? "sketch.rename" : "sketch.edit",
        actorId: actor.id,
        actorEmail: actor.email,
        workspaceId: row.workspaceId,
        targetType: "sketch",
        targetId: sketchId,
        detail: { sketchId, title: row.title, from: before.title, changed, ...(input.tags ? { tags: row.tags } : {}), ...(input.description !== undefined ? { described: true } : {}) },
      },
      tx,
    );
    return row;
  });
}

/** Delete a sketch with all its versions (owners). */
export async function removeSketch(sketchId: string, actor: Actor) {
  await requireSketchRole(sketchId, actor.id, "sketch.delete");
  let keys: string[] = [];
  const out = await db.transaction(async (tx) => {
    // its files' rows go with it (cascade); their objects are deleted once that commits
    keys = await keysOfSketch(sketchId, tx);
    const row = await deleteSketch({ sketchId, actorId: actor.id }, tx);
    if (!row) throw await accessLostError(sketchId, actor.id, "sketch.delete", tx);
    await recordAudit(
      { action: "sketch.delete", actorId: actor.id, actorEmail: actor.email, workspaceId: row.workspaceId, targetType: "sketch", targetId: sketchId, detail: { sketchId, title: row.title, versions: row.latestVersion } },
      tx,
    );
    return { id: row.id, deleted: true };
  });
  await deleteObjectsQuietly(keys);
  return out;
}

/**
 * Copy a version the actor may read into a workspace where they may fork: a new sketch whose
 * version 1 is that document, remembering where it came from.
 */
export async function forkSketch(sourceSketchId: string, actor: Actor, input: { workspaceId: string; version?: number; title?: string }) {
  const source = await requireSketchRole(sourceSketchId, actor.id, "sketch.read");
  const number = input.version ?? source.latestVersion;
  const version = await getVersion(sourceSketchId, number, actor.id);
  if (!version) throw new AppError("not_found", `This sketch has no version ${number}.`, { fields: [{ path: "version", message: `There is no version ${number}.` }] });
  // the role in the target is checked before any file is copied (and again, locked, in the transaction)
  const refused = forkTargetError(await getRole(input.workspaceId, actor.id));
  if (refused) throw refused;
  // a fork into another workspace takes its own copy of the underlay's file
  const copy = await copyUnderlayForFork(version.document, source.workspaceId, input.workspaceId);
  try {
    return await forkInTransaction(sourceSketchId, source, version, number, copy, actor, input);
  } catch (err) {
    await copy.discard();
    throw err;
  }
}

/** Why the caller may not fork into a workspace where they hold `role` (null: not a member), or null. */
function forkTargetError(role: Role | null): AppError | null {
  if (!role) return new AppError("not_found", "No such workspace, or you are not a member of it.", { fields: [{ path: "workspaceId", message: "You are not a member of that workspace." }] });
  if (!can(role, "sketch.fork")) return new AppError("forbidden", refusedWords(role, "sketch.fork").replace(" in this workspace ", " in that workspace "));
  return null;
}

function forkInTransaction(
  sourceSketchId: string,
  source: Awaited<ReturnType<typeof requireSketchRole>>,
  version: NonNullable<Awaited<ReturnType<typeof getVersion>>>,
  number: number,
  copy: UnderlayCopy,
  actor: Actor,
  input: { workspaceId: string; title?: string },
) {
  return db.transaction(async (tx) => {
    const refused = forkTargetError(await lockRole(tx, input.workspaceId, actor.id));
    if (refused) throw refused;
    const title = input.title ?? forkTitle(source.title);
    const made = await insertSketchWithFirstVersion(tx, {
      // the drawing carries the fork's name (the editor, the calc sheet and the listings agree)
      document: { ...copy.document, title },
      formatVersion: version.formatVersion,
      summary: version.summary,
      message: `Forked from “${source.title}” v${number}`,
      workspaceId: input.workspaceId,
      actorId: actor.id,
      title,
      // the fork carries what the sketch says about itself; its history starts afresh
      description: source.description ?? "",
      tags: source.tags ?? [],
      forkedFromVersionId: version.id,
      forkedFromTitle: source.title,
    });
    await copy.insert(tx, made.sketch.id, actor.id);
    const elsewhere = input.workspaceId !== source.workspaceId;
    await recordAudit(
      {
        action: "sketch.fork",
        actorId: actor.id,
        actorEmail: actor.email,
        workspaceId: input.workspaceId,
        targetType: "sketch",
        targetId: made.sketch.id,
        // not the origin's id, and its title only from the same workspace: members here may not be
        // allowed to see a sketch elsewhere
        detail: { sketchId: made.sketch.id, title, fromVersion: number, ...(elsewhere ? {} : { fromTitle: source.title }) },
      },
      tx,
    );
    // The origin's feed learns it was forked: into which sketch only when that is in the same workspace.
    await recordAudit(
      {
        action: "sketch.fork",
        actorId: actor.id,
        actorEmail: actor.email,
        workspaceId: source.workspaceId,
        targetType: "sketch",
        targetId: sourceSketchId,
        detail: { sketchId: sourceSketchId, title: source.title, fromVersion: number, origin: true, elsewhere, ...(elsewhere ? {} : { forkTitle: title, forkSketchId: made.sketch.id }) },
      },
      tx,
    );
    return made;
  });
}
