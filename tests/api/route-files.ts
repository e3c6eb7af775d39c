// Every route handler file under app/api, read from disk, so tests that must cover each route
// fail when a new one is added without them.
import { readdirSync, statSync } from "node:fs";
import { join, relative, sep } from "node:path";

const API_DIR = join(process.cwd(), "app", "api");

export function routeFiles(dir = API_DIR): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) return routeFiles(path);
    return name === "route.ts" ? [path] : [];
  });
}

/** `app/api/sketches/[id]/route.ts` → `/api/sketches/[id]`. */
export const routePath = (file: string) => "/" + relative(join(process.cwd(), "app"), file).split(sep).slice(0, -1).join("/");

/** A method the route does not serve (`otherMethods` in `lib/api.ts`: 405, or OPTIONS): not a route of its own. */
export const isNotAllowed = (handler: unknown): boolean => typeof handler === "function" && (handler as { notAllowed?: unknown }).notAllowed === true;
