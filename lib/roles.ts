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
