// Set-up that goes through the routes: a sketch made as an editor makes it, over HTTP.
import { expect } from "vitest";
import * as sketchesRoute from "@/app/api/workspaces/[id]/sketches/route";
import { call, type Json } from "./helpers";
import { fixture } from "./sketch-fixtures";

/**
 * A new sketch in workspace `ws`, made by `who` through POST /api/workspaces/:id/sketches (a 201,
 * or the test fails here); `document` is a fixture's name or a sketch file. Its id.
 */
export async function postSketch(ws: string, who: { cookie: string }, title: string, document: string | Json = "pump-skid-discharge", extra: Record<string, unknown> = {}): Promise<string> {
  const res = await call(sketchesRoute.POST, { method: "POST", params: { id: ws }, cookie: who.cookie, body: { title, ...extra, document: typeof document === "string" ? fixture(document) : document } });
  expect(res.status).toBe(201);
  return res.body.sketch.id as string;
}
