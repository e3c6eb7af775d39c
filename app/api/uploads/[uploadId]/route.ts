import { z } from "zod";
import { otherMethods, route } from "@/lib/api";
import { serveUpload } from "@/lib/uploads/serve";
import { removeUpload } from "@/lib/uploads/service";

export const dynamic = "force-dynamic";

const params = z.object({ uploadId: z.uuid() });

/** The file, for readers of its workspace (404 for everyone else). */
export const GET = route({ params }, async ({ req, params, user }) => serveUpload(req, params.uploadId, user.id, "file"));

/** An attachment: its comment's author. An underlay: editors and owners, while no saved version draws it. */
export const DELETE = route({ params }, async ({ params, user }) => ({ upload: await removeUpload(params.uploadId, user) }));

export const { POST, PUT, PATCH, OPTIONS } = otherMethods("GET", "DELETE");
