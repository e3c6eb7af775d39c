import { listSketches, listWorkspaceTags } from "@/db/queries/sketches";
import { json, otherMethods, route } from "@/lib/api";
import { createSketchInput, MAX_SKETCH_BYTES } from "@/lib/sketch-document";
import { listSketchesQuery } from "@/lib/sketch-schemas";
import { workspaceParams } from "@/lib/schemas";
import { createSketch } from "@/lib/sketches";

export const dynamic = "force-dynamic";

/** The workspace's sketches, one page at a time: `?q=&tag=&status=&sort=updated|title|status|created&dir=asc|desc&page=&pageSize=`. */
export const GET = route(
  { params: workspaceParams, query: listSketchesQuery, workspace: { param: "id", permission: "sketch.read" } },
  async ({ params, query, user }) => {
    const [page, tags] = await Promise.all([listSketches(params.id, user.id, query), listWorkspaceTags(params.id, user.id)]);
    return { ...page, tags };
  },
);

/** A new sketch (editors, owners): its document (or an empty one) becomes version 1. */
export const POST = route(
  { params: workspaceParams, body: createSketchInput, workspace: { param: "id", permission: "sketch.create" }, maxBodyBytes: MAX_SKETCH_BYTES },
  async ({ params, body, user }) => {
    const made = await createSketch(params.id, user, body);
    return json(
      {
        sketch: { id: made.sketch.id, workspaceId: made.sketch.workspaceId, title: made.sketch.title, tags: made.sketch.tags, latestVersion: 1 },
        version: { number: 1, createdAt: made.version.createdAt },
      },
      201,
    );
  },
);

export const { PUT, PATCH, DELETE, OPTIONS } = otherMethods("GET", "POST");
