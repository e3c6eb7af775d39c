import { otherMethods, parseJsonBody, route } from "@/lib/api";
import { signOffInput } from "@/lib/review/schemas";
import { readSignOff, requireSignOffParty, takeSignOffStep } from "@/lib/review/signoff";
import { versionParams } from "@/lib/sketch-schemas";

export const dynamic = "force-dynamic";

/**
 * The version's sign-off: state, record, title block (prepared / checked / approved), the steps open to the caller,
 * and, for an owner who may not approve a checked version, why not (`approval`).
 */
export const GET = route({ params: versionParams }, async ({ params, user }) => readSignOff(params.id, params.number, user.id));

/**
 * Take a step: `{ step: submit | check | return | approve | withdraw, note? }` (a return and a withdrawal need a note).
 * Who may take it depends on the step the body names, so a body that cannot be read is answered only after the
 * caller's standing: 404 for a non-member, 403 for a member the rules offer no step, then the body's own error.
 */
export const POST = route({ params: versionParams }, async ({ req, params, user }) => {
  const body = await parseJsonBody(req, signOffInput).catch(async (err: unknown) => {
    await requireSignOffParty(params.id, params.number, user.id);
    throw err;
  });
  return takeSignOffStep(params.id, params.number, user, body);
});

export const { PUT, PATCH, DELETE, OPTIONS } = otherMethods("GET", "POST");
