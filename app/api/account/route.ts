import { otherMethods, route } from "@/lib/api";
import { deleteAccount } from "@/lib/account-deletion";
import { deleteAccountInput } from "@/lib/schemas";

export const dynamic = "force-dynamic";

/**
 * Delete the signed-in account, its password typed again: refused (409 `last_owner`, naming the
 * workspaces) while the caller is the only owner of a workspace with other members; workspaces where
 * they are alone are deleted with it; their name stays on the record as "former member: <name>".
 */
export const DELETE = route({ body: deleteAccountInput }, async ({ req, user, body }) => ({
  account: await deleteAccount({ id: user.id, email: user.email, name: user.name }, body.password, req.headers),
}));

export const { GET, HEAD, POST, PUT, PATCH, OPTIONS } = otherMethods("DELETE");
