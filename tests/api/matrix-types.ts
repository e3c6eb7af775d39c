// Shapes shared by the authorization matrix and the rows other areas add to it.
import type { Json, Person } from "./helpers";

export type Caller = "owner" | "editor" | "checker" | "viewer" | "outsider" | "signedOut";
export const MATRIX_CALLERS: Caller[] = ["owner", "editor", "checker", "viewer", "outsider", "signedOut"];

export type Handler = (req: Request, ctx: { params: Promise<Record<string, string | string[] | undefined>> }) => Promise<Response>;

/** A fresh workspace per case: the four roles, a bare viewer to act upon, a sketch with version 1. */
export type Fixture = {
  ws: string;
  sketchId: string;
  versionId: string;
  targetId: string;
  invitationId: string;
  people: Record<Exclude<Caller, "signedOut">, Person>;
  /** an open invitation into the workspace addressed to `email` (its link's token) */
  tokenFor: (email: string) => Promise<string>;
  /** what a row's `prepare` made */
  extra: Record<string, string>;
};

export type Row = {
  expect: Record<Caller, number>;
  /** extra state the call needs (made once per case, before the call) */
  prepare?: (f: Fixture) => Promise<void>;
  run: (handler: Handler, f: Fixture, caller: Person) => Promise<{ status: number; body: Json }>;
  /** better-auth answers errors in its own shape */
  foreignErrors?: true;
};

export const all = (status: number): Record<Caller, number> => ({ owner: status, editor: status, checker: status, viewer: status, outsider: status, signedOut: status });
export const members = (ok: number): Record<Caller, number> => ({ owner: ok, editor: ok, checker: ok, viewer: ok, outsider: 404, signedOut: 401 });
export const ownersOnly = (ok: number): Record<Caller, number> => ({ owner: ok, editor: 403, checker: 403, viewer: 403, outsider: 404, signedOut: 401 });
export const editors = (ok: number): Record<Caller, number> => ({ owner: ok, editor: ok, checker: 403, viewer: 403, outsider: 404, signedOut: 401 });
export const signedIn = (ok: number): Record<Caller, number> => ({ ...all(ok), signedOut: 401 });
