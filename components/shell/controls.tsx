// Form controls and small status pieces shared by the account, workspace and (later) sketch screens.
import Link from "next/link";
import type { ComponentPropsWithRef, InputHTMLAttributes, KeyboardEvent, ReactNode, SelectHTMLAttributes } from "react";

type Tone = "primary" | "secondary" | "danger" | "quiet";

const TONES: Record<Tone, string> = {
  primary: "bg-ink text-paper hover:bg-ink-soft disabled:bg-ink-faint",
  secondary: "border border-ink/20 bg-paper-card text-ink hover:border-ink/45 disabled:text-ink-faint",
  danger: "border border-accent/40 bg-paper-card text-accent-deep hover:border-accent hover:bg-accent-soft/40 disabled:text-ink-faint",
  quiet: "text-ink-soft hover:text-ink hover:bg-paper-deep disabled:text-ink-faint",
};

/** The classes of a button of this tone and size, for a link drawn as a button too. */
export function buttonClass(tone: Tone = "primary", size: "sm" | "md" = "md"): string {
  const sizing = size === "sm" ? "px-2.5 py-1 text-[13px]" : "px-4 py-2 text-sm";
  return `inline-flex items-center justify-center gap-2 whitespace-nowrap rounded-md font-medium transition-colors disabled:cursor-not-allowed ${sizing} ${TONES[tone]}`;
}

export function Button({
  tone = "primary",
  busy = false,
  size = "md",
  className = "",
  children,
  ...rest
}: ComponentPropsWithRef<"button"> & { tone?: Tone; busy?: boolean; size?: "sm" | "md" }) {
  // busy, it refuses presses but stays focusable: a disabled button drops the keyboard's focus to
  // the page's start, and it would not come back when the request fails
  return (
    <button
      {...rest}
      disabled={rest.disabled}
      aria-disabled={busy || undefined}
      aria-busy={busy || undefined}
      onClick={(e) => {
        if (busy) {
          e.preventDefault();
          return;
        }
        rest.onClick?.(e);
      }}
      className={`${buttonClass(tone, size)} aria-disabled:cursor-wait aria-disabled:opacity-80 ${className}`}
    >
      {busy ? <Spinner /> : null}
      {children}
    </button>
  );
}

export function Spinner({ label }: { label?: string }) {
  return (
    <span className="inline-flex items-center gap-2" role={label ? "status" : undefined}>
      <span aria-hidden="true" className="inline-block h-3.5 w-3.5 animate-spin rounded-full border-2 border-current border-r-transparent" />
      {label ? <span>{label}</span> : null}
    </span>
  );
}

export function Field({
  label,
  hint,
  error,
  id,
  ...input
}: InputHTMLAttributes<HTMLInputElement> & { label: string; hint?: ReactNode; error?: string; id: string }) {
  // the hint gives way to the error on screen, and so in what the field is described by
  const described = (error ? `${id}-error` : hint ? `${id}-hint` : "") || undefined;
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block text-sm font-medium text-ink">
        {label}
      </label>
      <input
        id={id}
        {...input}
        aria-invalid={error ? true : undefined}
        aria-describedby={described}
        className={`block w-full rounded-md border bg-paper-card px-3 py-2 text-[15px] text-ink shadow-[inset_0_1px_0_rgb(var(--shade)/0.04)] outline-none placeholder:text-ink-faint focus:border-ink focus:ring-2 focus:ring-accent/25 disabled:bg-paper-deep ${
          error ? "border-accent" : "border-rule"
        }`}
      />
      {hint && !error ? (
        <p id={`${id}-hint`} className="text-xs text-ink-faint">
          {hint}
        </p>
      ) : null}
      {error ? (
        <p id={`${id}-error`} className="text-xs font-medium text-accent-deep">
          {error}
        </p>
      ) : null}
    </div>
  );
}

export function Select({
  label,
  id,
  hideLabel = false,
  children,
  ...props
}: SelectHTMLAttributes<HTMLSelectElement> & { label: string; id: string; hideLabel?: boolean }) {
  return (
    <div className="space-y-1">
      <label htmlFor={id} className={hideLabel ? "sr-only" : "block text-sm font-medium text-ink"}>
        {label}
      </label>
      <select
        id={id}
        {...props}
        className="block w-full rounded-md border border-rule bg-paper-card px-2.5 py-2 text-sm text-ink outline-none focus:border-ink focus:ring-2 focus:ring-accent/25 disabled:bg-paper-deep disabled:text-ink-faint"
      >
        {children}
      </select>
    </div>
  );
}

type NoticeTone = "error" | "success" | "info";
const NOTICE: Record<NoticeTone, { box: string; mark: string }> = {
  error: { box: "border-accent/40 bg-accent-soft/50 text-accent-deep", mark: "!" },
  success: { box: "border-reaction/30 bg-reaction-soft/70 text-reaction", mark: "✓" },
  info: { box: "border-rule bg-paper-deep/70 text-ink-soft", mark: "i" },
};

/** A message box marked by a symbol and words, not colour alone. */
export function Notice({ tone = "info", title, children }: { tone?: NoticeTone; title?: string; children?: ReactNode }) {
  const t = NOTICE[tone];
  return (
    <div role={tone === "error" ? "alert" : "status"} data-notice={tone} className={`flex gap-3 rounded-md border px-3.5 py-3 text-sm ${t.box}`}>
      <span aria-hidden="true" className="mt-px flex h-5 w-5 shrink-0 items-center justify-center rounded-full border border-current text-xs font-bold">
        {t.mark}
      </span>
      <div className="space-y-1">
        {title ? <p className="font-semibold">{title}</p> : null}
        {children ? <div className="leading-relaxed">{children}</div> : null}
      </div>
    </div>
  );
}

export function Skeleton({ className = "" }: { className?: string }) {
  return <span aria-hidden="true" className={`block animate-pulse rounded bg-rule-soft ${className}`} />;
}

export function EmptyState({ title, children, action }: { title: string; children?: ReactNode; action?: ReactNode }) {
  return (
    <div className="drafting-grid rounded-lg border border-dashed border-rule px-6 py-10 text-center">
      <p className="font-semibold text-ink">{title}</p>
      {children ? <div className="mx-auto mt-1.5 max-w-md text-sm text-ink-soft">{children}</div> : null}
      {action ? <div className="mt-4 flex justify-center">{action}</div> : null}
    </div>
  );
}

export function Panel({ title, description, children, aside }: { title: string; description?: ReactNode; children: ReactNode; aside?: ReactNode }) {
  return (
    <section className="rounded-lg border border-rule bg-paper-card shadow-[0_1px_0_rgb(var(--rule-soft))]" aria-label={title}>
      <header className="flex flex-wrap items-start justify-between gap-3 border-b border-rule-soft px-5 py-4">
        <div>
          <h2 className="text-base font-semibold text-ink">{title}</h2>
          {description ? <p className="mt-0.5 text-sm text-ink-soft">{description}</p> : null}
        </div>
        {aside}
      </header>
      <div className="px-5 py-4">{children}</div>
    </section>
  );
}

/** A choice of two or three ways to show the same thing (a labelled radio group of buttons). */
export function Segmented<T extends string>({
  label,
  value,
  options,
  onChange,
  testId,
  compact = false,
}: {
  label: string;
  value: T;
  options: ReadonlyArray<{ value: T; label: string; title?: string }>;
  onChange: (v: T) => void;
  testId?: string;
  /** a toolbar-sized switch whose label is read out but not shown */
  compact?: boolean;
}) {
  return (
    <div className={compact ? "" : "space-y-1"}>
      <span className={compact ? "sr-only" : "block text-sm font-medium text-ink"}>{label}</span>
      <div role="radiogroup" aria-label={label} data-testid={testId} className={`inline-flex items-center rounded-md border border-rule bg-paper-card p-1 text-sm ${compact ? "h-[34px]" : "h-[42px]"}`}>
        {options.map((o, i) => (
          <button
            key={o.value}
            type="button"
            role="radio"
            aria-checked={value === o.value}
            {...radioKeys(i, options.length, value === o.value, (k) => value !== options[k].value && onChange(options[k].value))}
            title={o.title}
            onClick={() => value !== o.value && onChange(o.value)}
            className={`h-full rounded px-3 font-medium focus-visible:outline-none focus-visible:ring-2 focus-visible:ring-accent/50 ${value === o.value ? "bg-ink text-paper" : "text-ink-soft hover:text-ink"}`}
          >
            {o.label}
          </button>
        ))}
      </div>
    </div>
  );
}

/**
 * Keyboard for a group of radio buttons (role="radio" buttons in a role="radiogroup"): one Tab
 * stop, the checked option; the arrow keys move the choice and the focus (WAI-ARIA Authoring
 * Practices, radio group pattern).
 */
export function radioKeys(index: number, count: number, checked: boolean, choose: (index: number) => void) {
  return {
    tabIndex: checked ? 0 : -1,
    onKeyDown: (e: KeyboardEvent<HTMLElement>) => {
      const step = e.key === "ArrowRight" || e.key === "ArrowDown" ? 1 : e.key === "ArrowLeft" || e.key === "ArrowUp" ? -1 : 0;
      if (!step) return;
      e.preventDefault();
      const next = (index + step + count) % count;
      choose(next);
      (e.currentTarget.parentElement?.querySelectorAll<HTMLElement>('[role="radio"]')[next])?.focus();
    },
  };
}

/** "Parent › here" above a page title: the parent is a link back. */
export function Crumb({ href, parent, here }: { href: string; parent: ReactNode; here: ReactNode }) {
  return (
    <p className="text-xs font-semibold uppercase tracking-[0.16em] text-ink-faint">
      <Link href={href} className="hover:text-ink">
        {parent}
      </Link>{" "}
      › {here}
    </p>
  );
}
