// The words and layout of the mail the app sends. Plain text first; the HTML is the same text
// with one button-like link, escaped.
import { ROLE_INFO, type Role } from "./roles";
import type { Mail } from "./mail";

function escapeHtml(s: string): string {
  return s.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);
}

function layout(paragraphs: string[], action: { label: string; url: string }, closing: string): string {
  const p = (t: string) => `<p style="margin:0 0 14px;line-height:1.5">${escapeHtml(t)}</p>`;
  return [
    `<div style="font-family:system-ui,sans-serif;color:#1d2329;background:#f6f3ec;padding:24px">`,
    `<div style="max-width:520px;margin:0 auto;background:#fbfaf6;border:1px solid #cfc8b8;border-radius:6px;padding:24px">`,
    `<p style="margin:0 0 18px;font-weight:600;font-size:17px">Counterpoise</p>`,
    ...paragraphs.map(p),
    `<p style="margin:20px 0"><a href="${escapeHtml(action.url)}" style="background:#1d2329;color:#fbfaf6;padding:10px 16px;border-radius:5px;text-decoration:none">${escapeHtml(action.label)}</a></p>`,
    p(`Or paste this address into your browser: ${action.url}`),
    `<p style="margin:18px 0 0;color:#5f6974;font-size:13px">${escapeHtml(closing)}</p>`,
    `</div></div>`,
  ].join("\n");
}

export function compose(to: string, subject: string, paragraphs: string[], action: { label: string; url: string }, closing: string): Mail {
  const text = [...paragraphs, `${action.label}: ${action.url}`, closing].join("\n\n");
  return { to, subject, text, html: layout(paragraphs, action, closing) };
}

export function verificationMail(input: { to: string; name: string; url: string }): Mail {
  return compose(
    input.to,
    "Confirm your e-mail address for Counterpoise",
    [`Hello ${input.name},`, "Confirm that this address is yours to finish setting up your Counterpoise account. The link works for one hour."],
    { label: "Confirm e-mail address", url: input.url },
    "If you did not create an account, ignore this mail: nothing happens without the link.",
  );
}

/** To the new address of an account changing its e-mail: the link makes the change (one hour). */
export function emailChangeMail(input: { to: string; name: string; url: string }): Mail {
  return compose(
    input.to,
    "Confirm your new e-mail address for Counterpoise",
    [`Hello ${input.name},`, "You asked to sign in to Counterpoise with this address from now on. Confirm it is yours and the change is made; until then the old address stays. The link works for one hour."],
    { label: "Use this address", url: input.url },
    "If you did not ask for this, ignore this mail: nothing changes without the link.",
  );
}

/** To the old address once a change of address is made: what changed, and what to do if it was not them. */
export function emailChangedNotice(input: { to: string; name: string; newEmail: string; url: string }): Mail {
  return compose(
    input.to,
    "Your Counterpoise sign-in address was changed",
    [`Hello ${input.name},`, `Your Counterpoise account now signs in with ${input.newEmail}, not with this address.`],
    { label: "Open Counterpoise", url: input.url },
    "If you did not make this change, someone else may hold your account: tell an owner of each of your workspaces at once, so they can remove it.",
  );
}

export function passwordResetMail(input: { to: string; name: string; url: string }): Mail {
  return compose(
    input.to,
    "Choose a new Counterpoise password",
    [`Hello ${input.name},`, "Someone asked to reset the password of your Counterpoise account. The link works once, for one hour."],
    { label: "Choose a new password", url: input.url },
    "If it was not you, ignore this mail: your password stays as it is.",
  );
}

/**
 * The mail for a sign-up with an address that already has an account. better-auth answers such a
 * sign-up as it answers a new one (a stranger learns nothing), and the page says a mail went out:
 * this is that mail, to the address's owner, with the way in (`url`: the sign-in page, address filled in).
 */
export function existingAccountMail(input: { to: string; name: string; url: string }): Mail {
  return compose(
    input.to,
    "You already have a Counterpoise account",
    [
      `Hello ${input.name},`,
      "Someone tried to create a Counterpoise account with this address, which already has one. To get in, sign in with your password.",
      'Forgot your password? Choose "Forgot your password?" on the sign-in page and we mail you a link to set a new one.',
    ],
    { label: "Sign in", url: input.url },
    "If it was not you, ignore this mail: your account and its password are unchanged.",
  );
}

export function invitationMail(input: {
  to: string;
  inviterName: string;
  workspaceName: string;
  role: Role;
  url: string;
  expiresAt: Date;
  /** an earlier open invitation to this address was replaced by this one (its link no longer works) */
  replaces?: boolean;
}): Mail {
  const role = ROLE_INFO[input.role];
  const until = input.expiresAt.toUTCString().replace(/:\d\d GMT$/, " UTC");
  return compose(
    input.to,
    `${input.replaces ? "New link: " : ""}${input.inviterName} invited you to "${input.workspaceName}" on Counterpoise`,
    [
      `${input.inviterName} invited you to join the workspace "${input.workspaceName}" as ${role.label.toLowerCase()}: ${role.summary}`,
      `The link works once, until ${until}.`,
      ...(input.replaces ? ["This invitation replaces the one sent to you earlier: the link in that mail no longer works, use this one."] : []),
    ],
    { label: "Open the invitation", url: input.url },
    "If you did not expect this, ignore this mail.",
  );
}

/** To every other member when an owner deletes a workspace: what went, and that nothing can be brought back. */
export function workspaceDeletedMail(input: {
  to: string;
  name: string;
  workspaceName: string;
  deletedBy: string;
  sketches: number;
  versions: number;
  url: string;
}): Mail {
  const sketches = `${input.sketches} ${input.sketches === 1 ? "sketch" : "sketches"}`;
  const versions = `${input.versions} ${input.versions === 1 ? "version" : "versions"}`;
  return compose(
    input.to,
    `"${input.workspaceName}" was deleted on Counterpoise`,
    [
      `Hello ${input.name},`,
      `${input.deletedBy} deleted the workspace "${input.workspaceName}", which you were a member of. Its ${sketches} with their ${versions}, comments, sign-offs and uploaded files were deleted with it and cannot be brought back.`,
      "Your account and your other workspaces are unchanged.",
    ],
    { label: "Open your workspaces", url: input.url },
    "If you did not expect this, ask the person who deleted it: exported sketch files or calc sheets they kept are the only copies left.",
  );
}

/** To the address of an account just deleted: what went, what stays, and what to do if it was not them. */
export function accountDeletedMail(input: { to: string; name: string; workspacesDeleted: string[]; url: string }): Mail {
  const deleted = input.workspacesDeleted.length
    ? [`The workspaces only you were in were deleted with it: ${input.workspacesDeleted.map((n) => `"${n}"`).join(", ")}.`]
    : [];
  return compose(
    input.to,
    "Your Counterpoise account was deleted",
    [
      `Hello ${input.name},`,
      "Your Counterpoise account was deleted: you can no longer sign in with this address and password, and you are no longer a member of any workspace.",
      ...deleted,
      `In the workspaces you shared, what you did stays as their record, under the name "former member: ${input.name}".`,
    ],
    { label: "Open Counterpoise", url: input.url },
    "If you did not do this, tell an owner of each workspace you were in at once. You can make a new account with this address.",
  );
}
