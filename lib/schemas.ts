// Request shapes shared by the route handlers (which enforce them) and the forms (which show
// the same messages before sending). Browser-safe.
import { z } from "zod";
import { ROLES } from "./roles";

export const roleSchema = z.enum(ROLES, { error: "Choose owner, editor, checker or viewer." });

export const workspaceNameSchema = z
  .string()
  .trim()
  .min(2, "Give the workspace a name of at least 2 characters.")
  .max(80, "Keep the workspace name under 80 characters.");

export const emailSchema = z
  .string()
  .trim()
  .toLowerCase()
  .pipe(z.email({ error: "Enter an e-mail address like name@company.com." }).max(254, "That e-mail address is too long."));

export const passwordSchema = z
  .string()
  .min(8, "Use at least 8 characters.")
  .max(128, "Use at most 128 characters.");

export const personNameSchema = z.string().trim().min(1, "Enter your name.").max(80, "Keep the name under 80 characters.");

export const createWorkspaceInput = z.object({ name: workspaceNameSchema });
export const renameWorkspaceInput = z.object({ name: workspaceNameSchema });
/** Deleting one's account: the password typed again. */
export const deleteAccountInput = z.object({ password: z.string({ error: "Type your password to confirm." }).min(1, "Type your password to confirm.").max(128, "Type your password to confirm.") });
/** Deleting a workspace: its name typed again (compared on the server, which says so under this field). */
export const deleteWorkspaceInput = z.object({
  confirmName: z.string({ error: "Type the workspace's name to confirm." }).max(200, "Type the workspace's name to confirm.").refine((s) => s.trim().length > 0, "Type the workspace's name to confirm."),
});
export const inviteInput = z.object({ email: emailSchema, role: roleSchema });
export const changeRoleInput = z.object({ role: roleSchema });
export const invitationSignUpInput = z.object({ name: personNameSchema, password: passwordSchema });

const uuidSchema = z.uuid();
/** A well-formed id of a workspace, sketch or other uuid-keyed row: anything else names nothing (and must not reach PostgreSQL). */
export function isUuid(id: string): boolean {
  return uuidSchema.safeParse(id).success;
}

export const workspaceParams = z.object({ id: z.uuid() });
export const memberParams = z.object({ id: z.uuid(), userId: z.string().min(1).max(100) });
export const invitationParams = z.object({ id: z.uuid(), invitationId: z.uuid() });
export const tokenParams = z.object({ token: z.string().min(10).max(200) });
export const auditQuery = z.object({
  before: z.coerce.number({ error: "before is the id of the last entry you have, a whole number." }).int("before is the id of the last entry you have, a whole number.").positive("before is the id of the last entry you have, a whole number.").optional(),
  limit: z.coerce.number({ error: "limit is a whole number from 1 to 200." }).int("limit is a whole number from 1 to 200.").min(1, "limit is a whole number from 1 to 200.").max(200, "limit is a whole number from 1 to 200.").optional(),
  /** "hide": leave the members' sign-ins out, so the changes to the workspace read on their own */
  signIns: z.enum(["show", "hide"], { error: 'must be "show" or "hide"' }).optional(),
});
