// The sign-off of a version: one table of who may take which step from which state, read by
// the server (to refuse, with a reason) and by the screens (to offer only what is allowed).
// The tests walk the same table, every step by every kind of person from every state.
// Browser-safe.
import type { Role } from "../roles";

export const REVIEW_STATES = ["draft", "submitted", "returned", "checked", "approved", "withdrawn"] as const;
export type ReviewState = (typeof REVIEW_STATES)[number];

export const SIGN_OFF_STEPS = ["submit", "check", "return", "approve", "withdraw"] as const;
export type SignOffStep = (typeof SIGN_OFF_STEPS)[number];

export const STATE_WORDS: Record<ReviewState, { label: string; sentence: string }> = {
  draft: { label: "prepared", sentence: "Prepared; not yet submitted for checking." },
  submitted: { label: "submitted", sentence: "Submitted for checking." },
  returned: { label: "returned", sentence: "Returned to its author with comments." },
  checked: { label: "checked", sentence: "Checked; waiting for approval." },
  approved: { label: "approved", sentence: "Approved. Locked: no new comments, and no sign-off step but withdrawal." },
  withdrawn: { label: "approval withdrawn", sentence: "Its approval was withdrawn; it may be submitted again." },
};

/** What the person did, as the sign-off record reads after their name (the note follows). */
export const STEP_RECORD: Record<SignOffStep, string> = {
  submit: "submitted it for checking",
  check: "checked it",
  return: "returned it",
  approve: "approved it",
  withdraw: "withdrew the approval",
};

export type SignOffRule = {
  /** the button */
  label: string;
  /** "checked v3", as the record reads */
  done: string;
  /** the states it may start from, and where it leads */
  from: readonly ReviewState[];
  to: ReviewState;
  /** roles that may take the step */
  roles: readonly Role[];
  /** the version's author: "also" may take it whatever their role; "never" may not */
  author: "also" | "never" | "as role";
  /** the person who checked the version may never take it */
  notChecker: boolean;
  /** a note is required (the reason of a return or a withdrawal) */
  noteRequired: boolean;
  /** a note is required while comment threads are open on the sketch (`noteForOpenThreads`): a
   *  signature given over an unanswered question says why it stands */
  noteWhenThreadsOpen: boolean;
  /** only the sketch's latest version may take it (a superseded version is not put forward) */
  latestOnly?: boolean;
  /** reasons of refusal, for people */
  refused: { role: string; author?: string; checker?: string; state: (state: ReviewState) => string; superseded?: (latest: number) => string };
};

export const SIGN_OFF_RULES: Record<SignOffStep, SignOffRule> = {
  submit: {
    label: "Submit for checking",
    done: "submitted for checking",
    from: ["draft", "returned", "withdrawn"],
    to: "submitted",
    roles: ["owner", "editor"],
    author: "also",
    notChecker: false,
    noteRequired: false,
    noteWhenThreadsOpen: false,
    latestOnly: true,
    refused: {
      role: "Submitting is for the version's author, editors and owners.",
      state: (s) => `This version is already ${STATE_WORDS[s].label}: it is submitted once per round.`,
      superseded: (latest) => `v${latest} is newer than this version: submit the latest version for checking (a superseded version is not put forward).`,
    },
  },
  check: {
    label: "Mark checked",
    done: "checked",
    from: ["submitted"],
    to: "checked",
    roles: ["owner", "checker"],
    author: "never",
    notChecker: false,
    noteRequired: false,
    noteWhenThreadsOpen: true,
    refused: {
      role: "Checking is for checkers and owners.",
      author: "You prepared this version: someone else must check it.",
      state: (s) => `Only a submitted version can be checked; this one is ${STATE_WORDS[s].label}.`,
    },
  },
  return: {
    label: "Return with comments",
    done: "returned",
    from: ["submitted"],
    to: "returned",
    roles: ["owner", "checker"],
    author: "never",
    notChecker: false,
    noteRequired: true,
    noteWhenThreadsOpen: false,
    refused: {
      role: "Returning a version is for checkers and owners.",
      author: "You prepared this version: someone else must check it.",
      state: (s) => `Only a submitted version can be returned; this one is ${STATE_WORDS[s].label}.`,
    },
  },
  approve: {
    label: "Approve",
    done: "approved",
    from: ["checked"],
    to: "approved",
    roles: ["owner"],
    author: "never",
    notChecker: true,
    noteRequired: false,
    noteWhenThreadsOpen: true,
    refused: {
      role: "Approval is for owners of the workspace.",
      author: "You prepared this version: another owner must approve it.",
      checker: "You checked this version: another owner must approve it.",
      state: (s) => `Only a checked version can be approved; this one is ${STATE_WORDS[s].label}.`,
    },
  },
  withdraw: {
    label: "Withdraw the approval",
    done: "withdrew the approval of",
    from: ["approved"],
    to: "withdrawn",
    roles: ["owner"],
    author: "as role",
    notChecker: false,
    noteRequired: true,
    noteWhenThreadsOpen: false,
    refused: {
      role: "Withdrawing an approval is for owners of the workspace.",
      state: (s) => `Only an approved version can have its approval withdrawn; this one is ${STATE_WORDS[s].label}.`,
    },
  },
};

/** The sketch's latest version number when it is newer than this version (null for the latest):
 *  what `SignOffInput.newer` takes. */
export const newerThan = (v: { number: number; latestVersion: number }): number | null => (v.latestVersion > v.number ? v.latestVersion : null);

export type SignOffInput = {
  step: SignOffStep;
  role: Role;
  isAuthor: boolean;
  isChecker: boolean;
  state: ReviewState;
  /** the sketch's latest version number when it is newer than this version */
  newer?: number | null;
};
export type SignOffDecision = { ok: true; to: ReviewState } | { ok: false; status: 403 | 409; code: "forbidden" | "review_state"; reason: string };

/** A refusal by role names the caller's role first: "You are a viewer in this workspace: checking is for checkers and owners." */
function roleRefusal(role: Role, rule: string): string {
  return `You are ${role === "owner" || role === "editor" ? "an" : "a"} ${role} in this workspace: ${rule.charAt(0).toLowerCase()}${rule.slice(1)}`;
}

/**
 * May this person take this step now? Who they are is asked first (403), then where the version
 * stands (409): a refusal always names the first rule that stops it.
 */
export function decideSignOff({ step, role, isAuthor, isChecker, state, newer }: SignOffInput): SignOffDecision {
  const rule = SIGN_OFF_RULES[step];
  const byRole = rule.roles.includes(role) || (rule.author === "also" && isAuthor);
  if (!byRole) return { ok: false, status: 403, code: "forbidden", reason: roleRefusal(role, rule.refused.role) };
  if (rule.author === "never" && isAuthor) return { ok: false, status: 403, code: "forbidden", reason: rule.refused.author! };
  if (rule.notChecker && isChecker) return { ok: false, status: 403, code: "forbidden", reason: rule.refused.checker! };
  if (!rule.from.includes(state)) return { ok: false, status: 409, code: "review_state", reason: rule.refused.state(state) };
  if (rule.latestOnly && newer) return { ok: false, status: 409, code: "review_state", reason: rule.refused.superseded!(newer) };
  return { ok: true, to: rule.to };
}

/** The steps this person may take on the version now (for the buttons). */
export function allowedSteps(input: Omit<SignOffInput, "step">): SignOffStep[] {
  return SIGN_OFF_STEPS.filter((step) => decideSignOff({ ...input, step }).ok);
}

/** Open comment threads per version of a sketch (`openThreadsOnSketch`: versions not approved). */
export type OpenThreads = ReadonlyArray<{ number: number; open: number }>;

function threads(n: number): string {
  return `${n} comment thread${n === 1 ? "" : "s"}`;
}

/**
 * The open threads on the sketch's other versions, from version `number`: earlier ones (a question
 * asked of v1 stands until answered) and later ones (asked of the drawing as it went on). What the
 * comments panel and the calc sheet's check record list, and what the sign-off counts besides the
 * version's own (`noteForOpenThreads`).
 */
export function openThreadsBesides(open: OpenThreads, number: number): { earlierOpen: Array<{ number: number; open: number }>; laterOpen: Array<{ number: number; open: number }> } {
  const shown = open.filter((v) => v.open > 0).map((v) => ({ number: v.number, open: v.open }));
  return { earlierOpen: shown.filter((v) => v.number < number), laterOpen: shown.filter((v) => v.number > number) };
}

/** "2 on this version, 1 on v1 and 1 on v4": where the open threads are, said from version `number`. */
export function openThreadsWhere(open: OpenThreads, number: number): string {
  const parts = open.filter((v) => v.open > 0).map((v) => (v.number === number ? `${v.open} on this version` : `${v.open} on v${v.number}`));
  return parts.length <= 1 ? (parts[0] ?? "") : `${parts.slice(0, -1).join(", ")} and ${parts[parts.length - 1]}`;
}

/**
 * Why a step on version `number` needs a note it was not given, or null: a check or an approval
 * (`noteWhenThreadsOpen`) while comment threads are still open on any version of the sketch that
 * is not approved — this one, an earlier one (a question asked of v1 stands until answered) or a
 * later one (asked of the drawing as it went on). The same words on the server (the refusal) and
 * in the dialog (the label of the note box).
 */
export function noteForOpenThreads(step: SignOffStep, open: OpenThreads, number: number): string | null {
  if (!SIGN_OFF_RULES[step].noteWhenThreadsOpen) return null;
  const total = open.reduce((n, v) => n + v.open, 0);
  if (!total) return null;
  const what = step === "approve" ? "approved" : "checked";
  return `${threads(total)} ${total === 1 ? "is" : "are"} still open (${openThreadsWhere(open, number)}): resolve ${total === 1 ? "it" : "them"}, or say in the note why the version stands ${what} with ${total === 1 ? "it" : "them"} open.`;
}
