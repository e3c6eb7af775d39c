// Workspace roles and what each may do: one table read by the server (to refuse) and by the
// UI (to hide). Browser-safe: no server imports.

export const ROLES = ["owner", "editor", "checker", "viewer"] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_INFO: Record<Role, { label: string; summary: string }> = {
  owner: { label: "Owner", summary: "Everything an editor can do, plus members, invitations, settings and approval." },
  editor: { label: "Editor", summary: "Creates and edits sketches, saves versions and forks them." },
  checker: { label: "Checker", summary: "Reads, comments and checks versions prepared by others." },
  viewer: { label: "Viewer", summary: "Reads sketches and their versions." },
};

/**
 * Actions and the roles allowed to take them. Later work (sketches, review) adds its actions
 * here so the server checks and the UI stay in one place.
 */
export const PERMISSIONS = {
  "workspace.read": ["owner", "editor", "checker", "viewer"],
  "workspace.rename": ["owner"],
  /** delete the workspace with its sketches, versions, comments and files */
  "workspace.delete": ["owner"],
  /** download every sketch of the workspace (the latest version of each) in one file */
  "workspace.export": ["owner"],
  "members.list": ["owner", "editor", "checker", "viewer"],
  "members.changeRole": ["owner"],
  "members.remove": ["owner"],
  "invitations.list": ["owner"],
  "invitations.create": ["owner"],
  "invitations.withdraw": ["owner"],
  "audit.read": ["owner"],
  "sketch.read": ["owner", "editor", "checker", "viewer"],
  "sketch.create": ["owner", "editor"],
  "sketch.edit": ["owner", "editor"],
  "sketch.delete": ["owner"],
  "version.save": ["owner", "editor"],
  "sketch.fork": ["owner", "editor"],
  "comment.create": ["owner", "editor", "checker"],
  /** resolve or reopen anyone's thread (authors may always edit, delete and resolve their own) */
  "comment.resolve": ["owner", "editor", "checker"],
  "version.submit": ["owner", "editor"],
  "version.check": ["owner", "checker"],
  "version.approve": ["owner"],
  "version.withdraw": ["owner"],
  /** upload a drawing or photo to trace over (an underlay) */
  "upload.underlay": ["owner", "editor"],
  /** attach images and PDFs to your comments */
  "upload.attach": ["owner", "editor", "checker"],
  /** fetch uploaded files and their thumbnails */
  "upload.read": ["owner", "editor", "checker", "viewer"],
} as const satisfies Record<string, readonly Role[]>;

export type Permission = keyof typeof PERMISSIONS;

export function can(role: Role | null | undefined, permission: Permission): boolean {
  return role != null && (PERMISSIONS[permission] as readonly Role[]).includes(role);
}

export function isRole(value: unknown): value is Role {
  return typeof value === "string" && (ROLES as readonly string[]).includes(value);
}

/** Each action in words, after "you may not" (the server's 403 says which one was refused). */
const ACTION_WORDS: Record<Permission, string> = {
  "workspace.read": "read this workspace",
  "workspace.rename": "rename the workspace",
  "workspace.delete": "delete the workspace",
  "workspace.export": "export the workspace's sketches",
  "members.list": "see the members",
  "members.changeRole": "change members' roles",
  "members.remove": "remove members",
  "invitations.list": "see the invitations",
  "invitations.create": "invite people",
  "invitations.withdraw": "withdraw invitations",
  "audit.read": "read the audit log",
  "sketch.read": "read sketches",
  "sketch.create": "create sketches",
  "sketch.edit": "rename sketches or change their details",
  "sketch.delete": "delete sketches",
  "version.save": "save versions",
  "sketch.fork": "fork sketches into it",
  "comment.create": "write comments",
  "comment.resolve": "resolve or reopen comments",
  "version.submit": "submit versions for checking",
  "version.check": "check or return versions",
  "version.approve": "approve versions",
  "version.withdraw": "withdraw approvals",
  "upload.underlay": "upload drawings to trace over",
  "upload.attach": "attach files to comments",
  "upload.read": "open uploaded files",
};

const plural = (r: Role) => `${r}s`;
const listed = (words: string[]) => (words.length < 2 ? words.join("") : `${words.slice(0, -1).join(", ")} and ${words[words.length - 1]}`);

/**
 * Why a role is refused an action, in one sentence naming both and who may: "As a viewer in this
 * workspace you may not save versions: that is for owners and editors."
 */
export function refusedWords(role: Role, permission: Permission): string {
  const who = listed((PERMISSIONS[permission] as readonly Role[]).map(plural));
  return `As ${role === "owner" || role === "editor" ? "an" : "a"} ${role} in this workspace you may not ${ACTION_WORDS[permission]}: that is for ${who}.`;
}
