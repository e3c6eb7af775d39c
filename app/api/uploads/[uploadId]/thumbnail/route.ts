import { z } from "zod";
import { otherMethods, route } from "@/lib/api";
import { serveUpload } from "@/lib/uploads/serve";

export const dynamic = "force-dynamic";

/** A PNG preview, at most 320 px a side, for readers of the file's workspace. */
export const GET = route({ params: z.object({ uploadId: z.uuid() }) }, async ({ req, params, user }) => serveUpload(req, params.uploadId, user.id, "thumbnail"));

export const { POST, PUT, PATCH, DELETE, OPTIONS } = otherMethods("GET");
