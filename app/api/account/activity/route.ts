import { otherMethods, route } from "@/lib/api";
import { accountActivity } from "@/lib/account-activity";

export const dynamic = "force-dynamic";

/**
 * The signed-in person's own recent account events (the last 20 sign-ins, sign-outs, password and
 * address changes, newest first; `thisDevice` marks the sign-in that started the asking session). Whose
 * they are comes from the session, never from the request.
 */
export const GET = route({}, async ({ user, session }) => ({ events: await accountActivity(user.id, session.session.id) }));

export const { POST, PUT, PATCH, DELETE, OPTIONS } = otherMethods("GET");
