import { db } from "@/db";
import { createWorkspace, listWorkspacesForUser } from "@/db/queries/workspaces";
import { json, otherMethods, route } from "@/lib/api";
import { recordAudit } from "@/lib/audit";
import { createWorkspaceInput } from "@/lib/schemas";

export const dynamic = "force-dynamic";

/** The caller's workspaces with their role in each. */
export const GET = route({}, async ({ user }) => ({ workspaces: await listWorkspacesForUser(user.id) }));

/** A new workspace; the caller becomes its owner. */
export const POST = route({ body: createWorkspaceInput }, async ({ user, body }) => {
  const ws = await db.transaction(async (tx) => {
    const made = await createWorkspace({ name: body.name, ownerId: user.id }, tx);
    await recordAudit(
      { action: "workspace.create", actorId: user.id, actorEmail: user.email, workspaceId: made.id, targetType: "workspace", targetId: made.id, detail: { name: made.name } },
      tx,
    );
    return made;
  });
  return json({ workspace: { ...ws, role: "owner" } }, 201);
});

export const { PUT, PATCH, DELETE, OPTIONS } = otherMethods("GET", "POST");
