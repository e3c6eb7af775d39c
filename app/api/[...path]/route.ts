import { route } from "@/lib/api";
import { AppError } from "@/lib/errors";

export const dynamic = "force-dynamic";

/**
 * An address under /api that no route serves, asked with any method: the API's JSON 404, so a
 * script with a mistyped path reads the same error shape as everywhere else (left to Next, it
 * would get the HTML not-found page). Every real route is more specific and wins over this one.
 */
const unknownAddress = route({ auth: "none" }, async ({ req }) => {
  throw new AppError("not_found", `There is no API address ${new URL(req.url).pathname}. Check the spelling; the README lists the addresses of the API.`);
});

export const GET = unknownAddress;
export const POST = unknownAddress;
export const PUT = unknownAddress;
export const PATCH = unknownAddress;
export const DELETE = unknownAddress;
export const OPTIONS = unknownAddress;
