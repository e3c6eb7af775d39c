// Mail about review: mentions in comments and sign-off steps. Same layout as the account mail.
import { compose } from "../mail-templates";
import type { Mail } from "../mail";
import { SIGN_OFF_RULES, type SignOffStep } from "./rules";
import { plainText } from "./comment-text";

// a mail is plain text: the comment's words without its formatting marks
const excerpt = (raw: string, max = 300) => {
  const text = plainText(raw);
  return text.length > max ? `${text.slice(0, max - 1)}…` : text;
};

export function mentionMail(input: { to: string; name: string; actorName: string; sketchTitle: string; number: number; text: string; url: string }): Mail {
  return compose(
    input.to,
    `${input.actorName} mentioned you on v${input.number} of "${input.sketchTitle}"`,
    [`Hello ${input.name},`, `${input.actorName} mentioned you in a comment on version ${input.number} of "${input.sketchTitle}":`, excerpt(input.text)],
    { label: "Open the comment", url: input.url },
    "You get this because someone mentioned you. Turn these mails off in your account settings.",
  );
}

const STEP_SUBJECT: Record<SignOffStep, string> = {
  submit: "submitted for checking",
  check: "checked",
  return: "returned with comments",
  approve: "approved",
  withdraw: "approval withdrawn",
};

export function signOffMail(input: { to: string; name: string; actorName: string; step: SignOffStep; sketchTitle: string; number: number; note: string; url: string }): Mail {
  const rule = SIGN_OFF_RULES[input.step];
  const what = `${input.actorName} ${rule.done} version ${input.number} of "${input.sketchTitle}".`;
  const next: Record<SignOffStep, string> = {
    submit: "It is waiting for a checker.",
    check: "It is waiting for approval by an owner.",
    return: "Answer the comments, save a new version and submit it again.",
    approve: "The version is locked: it takes no new comments, and no sign-off step but a withdrawal.",
    withdraw: "If the reason calls for a change, save a new version and submit that for checking; if not, this version may be submitted again.",
  };
  return compose(
    input.to,
    `v${input.number} of "${input.sketchTitle}": ${STEP_SUBJECT[input.step]}`,
    [`Hello ${input.name},`, what, ...(input.note ? [`"${excerpt(input.note, 600)}"`] : []), next[input.step]],
    { label: "Open the version", url: input.url },
    "You get this because you take part in this calculation. Turn these mails off in your account settings.",
  );
}
