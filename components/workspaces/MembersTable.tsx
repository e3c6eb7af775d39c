"use client";
import { useRouter } from "next/navigation";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useEffect, useRef, useState } from "react";
import { Button, Notice, Select, Skeleton } from "@/components/shell/controls";
import { apiFetch, apiKey, ApiError } from "@/lib/api-client";
import { can, ROLE_INFO, ROLES, type Role } from "@/lib/roles";
import { formatDate } from "./format";
import { RoleBadge } from "./RoleBadge";

export type Member = { userId: string; name: string; email: string; role: Role; joinedAt: string };

function RowActions({ member, canRemove, isSelf, lastOwner, onRemove, busy }: {
  member: Member;
  canRemove: boolean;
  isSelf: boolean;
  lastOwner: boolean;
  onRemove: () => void;
  busy: boolean;
}) {
  const [confirming, setConfirming] = useState(false);
  // the keyboard follows the question: to "Yes" when it is asked, back to the button when it is not
  const yes = useRef<HTMLButtonElement>(null);
  const ask = useRef<HTMLButtonElement>(null);
  const moved = useRef(false);
  useEffect(() => {
    if (!moved.current) return;
    (confirming ? yes : ask).current?.focus();
  }, [confirming]);
  const settle = (to: boolean) => {
    moved.current = true;
    setConfirming(to);
  };
  if (lastOwner) return <span className="text-xs text-ink-faint">Last owner</span>;
  if (!isSelf && !canRemove) return null;
  const verb = isSelf ? "Leave" : "Remove";
  if (!confirming) {
    return (
      <Button ref={ask} size="sm" tone="danger" onClick={() => settle(true)} aria-label={`${verb} ${isSelf ? "this workspace" : member.name}`}>
        {verb}
      </Button>
    );
  }
  return (
    // Escape takes the question back, as Cancel does
    <span
      className="inline-flex items-center gap-1.5"
      onKeyDown={(e) => {
        if (e.key !== "Escape") return;
        e.preventDefault();
        settle(false);
      }}
    >
      <Button ref={yes} size="sm" tone="danger" busy={busy} onClick={onRemove}>
        {isSelf ? "Yes, leave" : `Yes, remove ${member.name.split(" ")[0]}`}
      </Button>
      <Button size="sm" tone="quiet" onClick={() => settle(false)}>
        Cancel
      </Button>
    </span>
  );
}

/** Members and their roles. Owners change roles and remove people; everyone may leave (but the last owner). */
export function MembersTable({
  workspaceId,
  members,
  viewerRole,
  viewerId,
  loading,
}: {
  workspaceId: string;
  members: Member[] | undefined;
  viewerRole: Role;
  viewerId: string;
  loading: boolean;
}) {
  const router = useRouter();
  const qc = useQueryClient();
  const membersPath = `/api/workspaces/${workspaceId}/members`;
  const [message, setMessage] = useState<{ tone: "success" | "error"; text: string } | null>(null);
  const owners = members?.filter((m) => m.role === "owner").length ?? 0;
  const manage = can(viewerRole, "members.changeRole");
  // the only owner cannot leave or step down: say so where they look, not only in a tooltip
  const viewerIsLastOwner = owners === 1 && Boolean(members?.some((m) => m.userId === viewerId && m.role === "owner"));
  const lastOwnerNote = `members-last-owner-${workspaceId}`;

  const changeRole = useMutation({
    mutationFn: (v: { member: Member; role: Role }) => apiFetch(`${membersPath}/${encodeURIComponent(v.member.userId)}`, { method: "PATCH", body: { role: v.role } }),
    onSuccess: (_d, v) => {
      // the table says what the notice says at once, whether or not the reload that follows gets through
      qc.setQueryData<{ role: Role; members: Member[] }>(apiKey(membersPath), (old) =>
        old ? { ...old, members: old.members.map((m) => (m.userId === v.member.userId ? { ...m, role: v.role } : m)) } : old,
      );
      setMessage({ tone: "success", text: `${v.member.name} is now ${ROLE_INFO[v.role].label.toLowerCase()}.` });
    },
    onError: (err) => setMessage({ tone: "error", text: err instanceof ApiError ? err.message : "The role was not changed." }),
    onSettled: () => qc.invalidateQueries({ queryKey: apiKey(`/api/workspaces/${workspaceId}`) }),
  });

  const remove = useMutation({
    mutationFn: (member: Member) => apiFetch(`${membersPath}/${encodeURIComponent(member.userId)}`, { method: "DELETE" }),
    onSuccess: (_d, member) => {
      if (member.userId === viewerId) {
        // the workspaces list says which one was left (it reads the leaving from the audit log)
        router.push(`/workspaces?left=${encodeURIComponent(workspaceId)}`);
        router.refresh();
        return;
      }
      qc.setQueryData<{ role: Role; members: Member[] }>(apiKey(membersPath), (old) =>
        old ? { ...old, members: old.members.filter((m) => m.userId !== member.userId) } : old,
      );
      setMessage({ tone: "success", text: `${member.name} was removed from the workspace.` });
    },
    onError: (err) => setMessage({ tone: "error", text: err instanceof ApiError ? err.message : "Nobody was removed." }),
    onSettled: () => qc.invalidateQueries({ queryKey: apiKey(`/api/workspaces/${workspaceId}`) }),
  });

  return (
    <div className="space-y-3">
      {message ? <Notice tone={message.tone}>{message.text}</Notice> : null}
      <div className="relative overflow-x-auto">
        <table className="w-full text-sm">
          <caption className="sr-only">{loading ? "Loading the members" : "Members of this workspace"}</caption>
          <thead>
            <tr className="border-b border-rule text-left text-xs uppercase tracking-wider text-ink-faint">
              <th scope="col" className="py-2 pr-3 font-semibold">Name</th>
              <th scope="col" className="py-2 pr-3 font-semibold max-sm:hidden">E-mail</th>
              <th scope="col" className="w-44 py-2 pr-3 font-semibold max-sm:w-32">Role</th>
              <th scope="col" className="py-2 pr-3 font-semibold max-sm:hidden">Joined</th>
              <th scope="col" className="py-2 text-right font-semibold">
                <span className="sr-only">Actions</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {loading
              ? ["w-32", "w-48", "w-24"].map((w, i) => (
                  <tr key={i} className="border-b border-rule-soft" aria-hidden="true">
                    {[w, "w-44", "w-20", "w-16", "w-12"].map((cw, j) => (
                      // the e-mail's and the date's cells go on a phone, as their headings do
                      <td key={j} className={`py-3 pr-3 ${j === 1 || j === 3 ? "max-sm:hidden" : ""}`}>
                        <Skeleton className={`h-4 max-w-full ${cw}`} />
                      </td>
                    ))}
                  </tr>
                ))
              : members?.map((m) => {
                  const isSelf = m.userId === viewerId;
                  const lastOwner = m.role === "owner" && owners <= 1;
                  return (
                    <tr key={m.userId} className="border-b border-rule-soft last:border-0" data-testid={`member-${m.email}`}>
                      <td className="py-2.5 pr-3 font-medium text-ink">
                        {m.name}
                        {isSelf ? <span className="ml-1.5 rounded bg-paper-deep px-1.5 py-0.5 text-[11px] font-medium text-ink-soft">you</span> : null}
                        {/* a phone has no room for the e-mail's own column */}
                        <span className="block break-all text-xs font-normal text-ink-faint sm:hidden">{m.email}</span>
                      </td>
                      <td className="py-2.5 pr-3 text-ink-soft max-sm:hidden">{m.email}</td>
                      <td className="py-2 pr-3">
                        {manage ? (
                          <Select
                            id={`role-${m.userId}`}
                            label={`Role of ${m.name}`}
                            hideLabel
                            // the role asked for shows while the change is on its way
                            value={changeRole.isPending && changeRole.variables?.member.userId === m.userId ? changeRole.variables.role : m.role}
                            // not disabled while a change is on its way: that would drop the keyboard's focus
                            disabled={lastOwner}
                            aria-busy={(changeRole.isPending && changeRole.variables?.member.userId === m.userId) || undefined}
                            title={lastOwner ? "The last owner keeps the owner role: make someone else an owner first." : undefined}
                            aria-describedby={lastOwner && isSelf ? lastOwnerNote : undefined}
                            onChange={(e) => changeRole.mutate({ member: m, role: e.target.value as Role })}
                          >
                            {ROLES.map((r) => (
                              <option key={r} value={r}>
                                {ROLE_INFO[r].label}
                              </option>
                            ))}
                          </Select>
                        ) : (
                          <RoleBadge role={m.role} />
                        )}
                      </td>
                      <td className="num whitespace-nowrap py-2.5 pr-3 text-ink-soft max-sm:hidden">{formatDate(m.joinedAt)}</td>
                      <td className="py-2 text-right">
                        <RowActions
                          member={m}
                          isSelf={isSelf}
                          lastOwner={lastOwner}
                          canRemove={can(viewerRole, "members.remove")}
                          busy={remove.isPending}
                          onRemove={() => remove.mutate(m)}
                        />
                      </td>
                    </tr>
                  );
                })}
          </tbody>
        </table>
      </div>
      {viewerIsLastOwner ? (
        <p id={lastOwnerNote} className="text-xs leading-relaxed text-ink-soft">
          You are the only owner, so you cannot leave this workspace or give up the owner role.{" "}
          {members && members.length > 1
            ? "To do either, make another member an owner first."
            : "To do either, invite a colleague, then make them an owner."}
        </p>
      ) : null}
    </div>
  );
}
