import { z } from "zod";
import { json, otherMethods, parseJsonBody, route } from "@/lib/api";
import { AppError } from "@/lib/errors";
import { clientAddress, createRateLimiter } from "@/lib/rate-limit";
import { MAX_SKETCH_BYTES } from "@/lib/sketch-document";
import { solveFile } from "@/solver";

export const dynamic = "force-dynamic";

const limiter = createRateLimiter("solve");

function budget(): { max: number; window: number } {
  const max = Number(process.env.SOLVE_RATE_LIMIT_MAX);
  const window = Number(process.env.SOLVE_RATE_LIMIT_WINDOW);
  return { max: Number.isFinite(max) && max > 0 ? max : 60, window: Number.isFinite(window) && window > 0 ? window : 60 };
}

/**
 * Solve a sketch file sent as the request body, for scripts: no sign-in, at most 1 MB, and a
 * budget of SOLVE_RATE_LIMIT_MAX requests per SOLVE_RATE_LIMIT_WINDOW seconds per address.
 * The answer is what `npm run solve` prints; an invalid sketch is a 400 naming the fields.
 */
export const POST = route({ auth: "none" }, async ({ req }) => {
  const { max, window } = budget();
  // counted before the body is read, so malformed and oversized requests spend the budget too
  await limiter.hit(clientAddress(req), max, window);
  const body = await parseJsonBody(req, z.unknown(), MAX_SKETCH_BYTES);
  const result = solveFile(body);
  if (!result.ok) {
    throw new AppError("validation_failed", "The sketch is not valid; the fields say why.", { fields: result.errors.slice(0, 50).map((e) => ({ path: e.path || "(root)", message: e.message })) });
  }
  return json(result);
});

export const { GET, HEAD, PUT, PATCH, DELETE, OPTIONS } = otherMethods("POST");
