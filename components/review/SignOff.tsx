"use client";
// The sign-off of a version: where it stands, the title block (prepared / checked / approved,
// with names and dates), the steps open to the reader, and the record of every step.
import { useMutation, useQueryClient } from "@tanstack/react-query";
import Link from "next/link";
import { useState } from "react";
import { Button, Notice } from "@/components/shell/controls";
import { Dialog } from "@/components/versions/Dialog";
import { formatDateTime } from "@/components/workspaces/format";
import { apiFetch, ApiError } from "@/lib/api-client";
import { decideSignOff, noteForOpenThreads, SIGN_OFF_RULES, SIGN_OFF_STEPS, STATE_WORDS, STEP_RECORD, type OpenThreads, type ReviewState, type SignOffStep } from "@/lib/review/rules";
import type { Role } from "@/lib/roles";
import { withOpenThreads } from "./concerns";

export type TitleBlockEntry = { name: string; date: string };
export type SignOffData = {
  state: ReviewState;
  sentence: string;
  entries: Array<{ id: number; step: SignOffStep; actorName: string; note: string; at: string }>;
  titleBlock: { prepared: TitleBlockEntry; checked: TitleBlockEntry | null; approved: TitleBlockEntry | null };
  allowed: SignOffStep[];
  /** the sketch's latest version, when it is newer than this one */
  newer?: number | null;
  /** for an owner who may not approve this checked version: why, and (when no other owner may) what to do */
  approval?: { reason: string; remedy: string | null; membersPath: string } | null;
  /** the reader's part in this version */
  you?: { role: Role; isAuthor: boolean; isChecker: boolean };
  /** open comment threads per version of the sketch (not approved ones; this one too): a check or an approval over them needs a note */
  openThreads?: OpenThreads;
};

/**
 * Why a reader whose role takes the version's next step is offered no button: they prepared it
 * (no self-check) or checked it (no self-approval), in the rule's own words. Null when a step is
 * open, when the role takes no part, or when another note already says why.
 */
export function whyNoStep(data: Pick<SignOffData, "state" | "allowed" | "you" | "newer" | "approval">): string | null {
  if (data.allowed.length || !data.you || data.approval) return null;
  for (const step of SIGN_OFF_STEPS) {
    const rule = SIGN_OFF_RULES[step];
    if (!rule.from.includes(data.state) || !rule.roles.includes(data.you.role)) continue;
    const decision = decideSignOff({ step, ...data.you, state: data.state, newer: data.newer });
    if (!decision.ok && decision.status === 403) return decision.reason;
  }
  return null;
}

/** Why the reader, an owner, may not approve the checked version; "the Members page" in the remedy links there. */
function ApprovalNote({ approval }: { approval: NonNullable<SignOffData["approval"]> }) {
  const PAGE = "the Members page";
  const at = approval.remedy?.indexOf(PAGE) ?? -1;
  return (
    <div className="rounded-md border border-caution/40 bg-caution-soft px-3 py-2 text-[13px] text-ink" data-testid="signoff-approval" role="note">
      <p>{approval.reason}</p>
      {approval.remedy ? (
        <p className="mt-1">
          {at < 0 ? (
            approval.remedy
          ) : (
            <>
              {approval.remedy.slice(0, at)}
              <Link href={approval.membersPath} className="font-medium underline decoration-ink/30 underline-offset-2 hover:decoration-ink">
                {PAGE}
              </Link>
              {approval.remedy.slice(at + PAGE.length)}
            </>
          )}
        </p>
      ) : null}
    </div>
  );
}

const MARK: Record<ReviewState, { mark: string; box: string }> = {
  draft: { mark: "○", box: "border-rule bg-paper-deep text-ink-soft" },
  submitted: { mark: "◐", box: "border-caution/40 bg-caution-soft text-caution" },
  returned: { mark: "↩", box: "border-accent/40 bg-accent-soft/60 text-accent-deep" },
  checked: { mark: "✓", box: "border-reaction/35 bg-reaction-soft text-reaction" },
  approved: { mark: "✓✓", box: "border-ink/40 bg-ink text-paper" },
  withdrawn: { mark: "⊘", box: "border-accent/40 bg-paper-card text-accent-deep" },
};

/** The sign-off state as a mark and a word. */
export function ReviewBadge({ state }: { state: ReviewState }) {
  const m = MARK[state];
  return (
    <span className={`inline-flex items-center gap-1 whitespace-nowrap rounded border px-1.5 py-0.5 text-xs font-medium ${m.box}`} title={STATE_WORDS[state].sentence} data-review-state={state}>
      <span aria-hidden="true">{m.mark}</span>
      {STATE_WORDS[state].label}
    </span>
  );
}

export function TitleBlock({ block, state }: { block: SignOffData["titleBlock"]; state: ReviewState }) {
  const cell = (what: string, e: TitleBlockEntry | null) => (
    <div className="border-rule px-3 py-2 [&:not(:first-child)]:border-l" data-testid={`title-block-${what}`}>
      <p className="text-[11px] font-semibold uppercase tracking-wider text-ink-faint">{what} by</p>
      <p className="mt-0.5 font-medium text-ink">{e ? e.name : "—"}</p>
      <p className="num text-xs text-ink-soft">{e ? formatDateTime(e.date) : "not yet"}</p>
    </div>
  );
  return (
    <div className={`grid grid-cols-3 rounded-md border text-sm ${state === "approved" ? "border-ink" : "border-rule"}`} aria-label="Title block" role="group">
      {cell("prepared", block.prepared)}
      {cell("checked", block.checked)}
      {cell("approved", block.approved)}
    </div>
  );
}

/**
 * Words that name versions ("1 on v1 and 1 on v4"), each of `versions` linked to its comments,
 * where the open threads are; plain words without `href`.
 */
export function VersionLinkedText({ text, versions, href }: { text: string; versions: ReadonlyArray<number>; href?: (n: number) => string }) {
  if (!href) return <>{text}</>;
  const parts = text.split(/\b(v\d+)\b/);
  return (
    <>
      {parts.map((part, i) => {
        const n = /^v(\d+)$/.exec(part)?.[1];
        return n !== undefined && versions.includes(Number(n)) ? (
          <Link key={i} href={`${href(Number(n))}#comments`} className="font-medium underline decoration-ink/30 underline-offset-2 hover:decoration-ink">
            {part}
          </Link>
        ) : (
          part
        );
      })}
    </>
  );
}

/** What a check or an approval of a superseded version signs off: that version, not the newer one. */
const SUPERSEDED_STEP: Partial<Record<SignOffStep, string>> = { check: "marking a superseded version checked", approve: "approving a superseded version" };
const SUPERSEDED_ACT: Partial<Record<SignOffStep, string>> = { check: "this check", approve: "this approval" };

function StepDialog({
  step,
  path,
  concerns,
  newer,
  unanswered,
  threadLines,
  openVersions = [],
  versionHref,
  onClose,
  onDone,
}: {
  step: SignOffStep;
  path: string;
  concerns: readonly string[];
  newer?: number | null;
  /** `noteForOpenThreads`: the step needs a note, as comment threads are still open */
  unanswered: string | null;
  /** the findings that speak of open threads (`withOpenThreads`): said once, by `unanswered`, when it is set */
  threadLines: readonly string[];
  /** the other versions with open threads: named in the words above, each linked to its comments */
  openVersions?: readonly number[];
  versionHref?: (n: number) => string;
  onClose: () => void;
  onDone: () => void;
}) {
  const rule = SIGN_OFF_RULES[step];
  const noteRequired = rule.noteRequired || unanswered !== null;
  const [note, setNote] = useState("");
  const take = useMutation({ mutationFn: () => apiFetch(path, { method: "POST", body: { step, ...(note.trim() ? { note: note.trim() } : {}) } }), onSuccess: onDone });
  const err = take.error instanceof ApiError ? take.error : null;
  const prompt: Record<SignOffStep, string> = {
    submit: "Anything the checker should know (optional)",
    check: "A note for the record (optional)",
    return: "What needs to change (required)",
    approve: "A note for the record (optional)",
    withdraw: "Why the approval is withdrawn (required)",
  };
  // the findings above ask "or say why not": the box says it is the place for that
  const listed = unanswered ? concerns.filter((c) => !threadLines.includes(c)) : concerns;
  const findings = (step === "submit" || step === "check" || step === "approve") && listed.length > 0;
  return (
    <Dialog open onClose={onClose} title={rule.label} testId="signoff-dialog">
      <form
        className="space-y-3"
        onSubmit={(e) => {
          e.preventDefault();
          take.mutate();
        }}
      >
        {findings ? (
          <div className="rounded-md border border-caution/40 bg-caution-soft p-3 text-[13px] text-ink" data-testid="signoff-concerns" role="note">
            <p className="font-semibold">Before you {step === "approve" ? "approve" : step === "check" ? "mark it checked" : "submit it (say in the note why it stands)"}, this version shows:</p>
            <ul className="mt-1 list-disc space-y-0.5 pl-5">
              {listed.map((c) => (
                <li key={c}>{threadLines.includes(c) ? <VersionLinkedText text={c} versions={openVersions} href={versionHref} /> : c}</li>
              ))}
            </ul>
          </div>
        ) : null}
        {newer && SUPERSEDED_STEP[step] ? (
          <p className="rounded-md border border-caution/40 bg-caution-soft px-3 py-2 text-[13px] text-ink" data-testid="signoff-dialog-superseded" role="note">
            You are {SUPERSEDED_STEP[step]}: v{newer} was saved after it, and {SUPERSEDED_ACT[step]} does not carry over to v{newer}.
          </p>
        ) : null}
        {unanswered ? (
          <p className="rounded-md border border-caution/40 bg-caution-soft px-3 py-2 text-[13px] text-ink" data-testid="signoff-open-threads" role="note">
            <VersionLinkedText text={unanswered} versions={openVersions} href={versionHref} />
          </p>
        ) : null}
        <label htmlFor="signoff-note" className="block text-sm font-medium text-ink">
          {unanswered
            ? "Why it stands with the open threads (required; kept in the sign-off record)"
            : findings
              ? "Why it stands despite the above (optional; kept in the sign-off record)"
              : prompt[step]}
        </label>
        <textarea
          id="signoff-note"
          rows={3}
          maxLength={2000}
          value={note}
          onChange={(e) => setNote(e.target.value)}
          className="block w-full rounded-md border border-rule bg-paper-card px-3 py-2 text-sm outline-none focus:border-ink focus:ring-2 focus:ring-accent/25"
        />
        {err ? <Notice tone="error">{err.field("note") ?? err.message}</Notice> : null}
        <div className="flex justify-end gap-2">
          <Button type="button" tone="quiet" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" busy={take.isPending} disabled={noteRequired && !note.trim()}>
            {rule.label}
          </Button>
        </div>
      </form>
    </Dialog>
  );
}

/** `concerns`: what the version's own results say its author, checker or approver must not miss (a case not held, a factor of safety short). */
/** `number`: the version signed off (its open threads are told apart from other versions'). */
/** `versionHref`: the review page of another version (the open threads' versions link there). */
export function SignOffPanel({
  data,
  path,
  number,
  concerns = [],
  versionHref,
  onChanged,
}: {
  data: SignOffData;
  path: string;
  number: number;
  concerns?: readonly string[];
  versionHref?: (n: number) => string;
  onChanged: () => void;
}) {
  const [step, setStep] = useState<SignOffStep | null>(null);
  const qc = useQueryClient();
  const why = whyNoStep(data);
  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-center gap-2">
        <ReviewBadge state={data.state} />
        <p className="text-sm text-ink-soft">{data.sentence}</p>
      </div>
      {data.approval && data.state === "checked" ? <ApprovalNote approval={data.approval} /> : null}
      <TitleBlock block={data.titleBlock} state={data.state} />
      {data.newer && (data.state === "draft" || data.state === "returned" || data.state === "withdrawn") ? (
        <p className="text-sm text-ink-soft" data-testid="signoff-superseded">
          v{data.newer} is newer: only the latest version is submitted for checking.
        </p>
      ) : data.newer && (data.state === "submitted" || data.state === "checked") ? (
        // still checked and approved on its own, but the newer version does not inherit it
        <p className="text-sm text-caution" data-testid="signoff-superseded" role="note">
          v{data.newer} was saved after this version: a check or approval given here is of this version only and does not carry over to v{data.newer}.
        </p>
      ) : null}
      {why ? (
        <p className="text-sm text-ink-soft" data-testid="signoff-why-not" role="note">
          {why}
        </p>
      ) : null}
      {data.allowed.length ? (
        <div className="flex flex-wrap gap-2">
          {data.allowed.map((s) => (
            <Button key={s} size="sm" tone={s === "return" || s === "withdraw" ? "danger" : "primary"} onClick={() => setStep(s)} data-testid={`signoff-${s}`}>
              {SIGN_OFF_RULES[s].label}
            </Button>
          ))}
        </div>
      ) : null}
      {data.entries.length ? (
        <ol className="space-y-1.5 border-l-2 border-rule-soft pl-3 text-[13px]" aria-label="Sign-off record">
          {data.entries.map((e) => (
            <li key={e.id}>
              <span className="font-medium text-ink">{e.actorName}</span> <span className="text-ink-soft">{STEP_RECORD[e.step]}</span>{" "}
              <span className="num text-xs text-ink-faint">· {formatDateTime(e.at)}</span>
              {e.note ? <q className="block text-ink-soft">{e.note}</q> : null}
            </li>
          ))}
        </ol>
      ) : null}
      {step ? (
        <StepDialog
          step={step}
          path={path}
          concerns={concerns}
          newer={data.newer}
          unanswered={noteForOpenThreads(step, data.openThreads ?? [], number)}
          threadLines={withOpenThreads([], data.openThreads ?? [], number)}
          openVersions={(data.openThreads ?? []).filter((v) => v.open > 0 && v.number !== number).map((v) => v.number)}
          versionHref={versionHref}
          onClose={() => setStep(null)}
          onDone={() => {
            setStep(null);
            void qc.invalidateQueries({ queryKey: ["api", "sketches"] });
            onChanged();
          }}
        />
      ) : null}
    </div>
  );
}
