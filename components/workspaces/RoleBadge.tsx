import { ROLE_INFO, type Role } from "@/lib/roles";

// Each role has its own mark as well as its own tint, so the badge reads without colour.
const STYLE: Record<Role, { mark: string; box: string }> = {
  owner: { mark: "◆", box: "border-ink/30 bg-ink text-paper" },
  editor: { mark: "✎", box: "border-accent/35 bg-accent-soft/70 text-accent-deep" },
  checker: { mark: "✓", box: "border-reaction/35 bg-reaction-soft text-reaction" },
  viewer: { mark: "○", box: "border-rule bg-paper-deep text-ink-soft" },
};

export function RoleBadge({ role }: { role: Role }) {
  const s = STYLE[role];
  return (
    <span className={`inline-flex items-center gap-1 rounded border px-1.5 py-0.5 text-xs font-medium ${s.box}`} title={ROLE_INFO[role].summary}>
      <span aria-hidden="true">{s.mark}</span>
      {ROLE_INFO[role].label}
    </span>
  );
}
