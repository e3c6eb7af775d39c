import { z } from "zod";
import { getVersion } from "@/db/queries/versions";
import { approvedAfter, approvedBefore, getVersionForCalcSheet } from "@/db/queries/review";
import { listVersionComments, openThreadsOnSketch } from "@/db/queries/comments";
import { otherMethods, route } from "@/lib/api";
import { calcSheetErrorPage, wantsHtml } from "@/lib/calcsheet/error-page";
import { buildCalcSheet } from "@/lib/calcsheet/pdf";
import { AppError } from "@/lib/errors";
import { openThreadsBesides } from "@/lib/review/rules";
import { isUuid } from "@/lib/schemas";
import { versionParams } from "@/lib/sketch-schemas";
import { requireSketchRole } from "@/lib/sketches";
import { parseSketch } from "@/solver";

export const dynamic = "force-dynamic";
export const runtime = "nodejs";

const query = z.object({ units: z.enum(["SI", "US"], { error: "units must be SI or US" }).default("SI") });

/** The calc sheet of a saved version as a PDF, for anyone who may read the sketch. */
const makeSheet = route({ params: versionParams, query }, async ({ params, query, user }) => {
  await requireSketchRole(params.id, user.id, "sketch.read");
  const version = await getVersion(params.id, params.number, user.id);
  if (!version) throw new AppError("not_found", `This sketch has no version ${params.number}.`);
  const sheet = await getVersionForCalcSheet(version.id, user.id);
  if (!sheet) throw new AppError("not_found", `This sketch has no version ${params.number}.`);
  // saved versions were valid when saved; one this release no longer reads is said, not a bare 500
  const readable = parseSketch(sheet.document);
  if (!readable.ok) {
    const why = readable.errors.slice(0, 3).map((e) => `${e.path}: ${e.message}`).join("; ");
    console.error(`[calc-sheet] version ${params.number} of sketch ${params.id} does not parse: ${why}`);
    throw new AppError(
      "internal",
      `Version ${params.number}'s saved sketch does not read (${why}${readable.errors.length > 3 ? "; …" : ""}), so its calc sheet cannot be made. Open the sketch, put it right and save a new version.`,
    );
  }
  const approved = sheet.reviewState === "approved";
  const [comments, openOnSketch, approvedEarlier, approvedLater] = await Promise.all([
    listVersionComments(sheet.versionId, user.id),
    openThreadsOnSketch(params.id),
    approved ? null : approvedBefore(params.id, sheet.versionNumber),
    approved && sheet.latestVersion > sheet.versionNumber ? approvedAfter(params.id, sheet.versionNumber) : undefined,
  ]);
  const pdf = await buildCalcSheet({
    workspace: sheet.workspaceName,
    sketchTitle: sheet.sketchTitle,
    version: sheet.versionNumber,
    latestVersion: sheet.latestVersion,
    versionMessage: sheet.message ?? undefined,
    savedAt: sheet.savedAt,
    signoff: sheet.signOff.map((s) => ({ role: s.role, name: s.name, at: s.date })),
    review: sheet.review,
    approvedEarlier: approvedEarlier ?? undefined,
    approvedLater,
    file: sheet.document,
    // the open threads of the other versions, earlier and later, as the comments panel lists them
    // and the sign-off counts them
    record: { steps: sheet.steps, comments, ...openThreadsBesides(openOnSketch, sheet.versionNumber) },
    units: query.units,
  });
  const name = `${sheet.sketchTitle.replace(/[^\w.-]+/g, "-").replace(/^-|-$/g, "").slice(0, 60) || "sketch"}-v${sheet.versionNumber}-calc-sheet-${query.units}.pdf`;
  return new Response(new Uint8Array(pdf), {
    headers: {
      "content-type": "application/pdf",
      "content-disposition": `attachment; filename="${name}"`,
      "cache-control": "private, no-store",
    },
  });
});

/** A browser that opens the link (no JavaScript) reads a failure as a page; API clients keep the JSON. */
export async function GET(req: Request, ctx: { params: Promise<Record<string, string | string[] | undefined>> }): Promise<Response> {
  const res = await makeSheet(req, ctx);
  if (res.ok || !wantsHtml(req)) return res;
  const { id } = await ctx.params;
  const sketchPath = typeof id === "string" && isUuid(id) ? `/sketches/${id}` : "/workspaces";
  return calcSheetErrorPage(res, { sketchPath, signInPath: `/sign-in?next=${encodeURIComponent(sketchPath)}` });
}

export const { POST, PUT, PATCH, DELETE, OPTIONS } = otherMethods("GET");
