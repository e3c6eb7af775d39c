import { route } from "@/lib/api";
import { signOffInput } from "@/lib/review/schemas";
import { readSignOff, takeSignOffStep } from "@/lib/review/signoff";
import { versionParams } from "@/lib/sketch-schemas";

export const dynamic = "force-dynamic";

/** The version's sign-off: state, record, title block (prepared / checked / approved) and the steps open to the caller. */
export const GET = route({ params: versionParams }, async ({ params, user }) => readSignOff(params.id, params.number, user.id));

/** Take a step: `{ step: submit | check | return | approve | withdraw, note? }` (a return and a withdrawal need a note). */
export const POST = route({ params: versionParams, body: signOffInput }, async ({ params, body, user }) => takeSignOffStep(params.id, params.number, user, body));
