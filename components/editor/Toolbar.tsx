"use client";
// The editor's header: the sketch's name and where it is kept, File and Examples menus, undo
// and redo, the view, snapping and the SI / US switch. Every button runs a registered action.
import Link from "next/link";
import type { ReactNode } from "react";
import { radioKeys } from "@/components/shell/controls";
import { ProductMark } from "@/components/site/Wordmark";
import { actionTitle, menuActions, shortcutLabel, type Action } from "@/canvas/actions";
import { useEditor } from "@/canvas/context";
import { EXAMPLES } from "@/canvas/examples";
import { convert, type UnitSystem } from "@/solver/units";
import { FileMenuLinksProvider, useFileMenuLinkList } from "./fileMenuLinks";
import { Menu, type MenuItem } from "./Menu";
import { useActionRunner } from "./useActions";
import { ICON_BUTTON } from "./ui";

function menuItems(actions: Action[], run: (id: string) => boolean): MenuItem[] {
  return actions.map((a) => ({ id: a.id, label: a.label, shortcut: a.shortcuts?.[0] ? shortcutLabel(a.shortcuts[0]) : undefined, onSelect: () => run(a.id) }));
}

/** The zoom as screen pixels per metre, or per foot in US units. */
export function drawingScale(pxPerM: number, units: UnitSystem): string {
  const one = convert(1, "length", units);
  const px = pxPerM / one.value;
  return `${px >= 100 ? Math.round(px) : px.toFixed(1)} px/${one.unit}`;
}

export function UnitSwitch() {
  const units = useEditor((s) => s.units);
  const run = useActionRunner();
  return (
    <div role="radiogroup" aria-label="Units shown" className="flex h-7 items-center rounded border border-rule bg-paper-card p-0.5 text-[12px] pointer-coarse:h-[42px] pointer-coarse:p-0" data-testid="units">
      {(["SI", "US"] as const).map((u, i) => (
        <button
          key={u}
          type="button"
          role="radio"
          aria-checked={units === u}
          {...radioKeys(i, 2, units === u, (k) => (k === 0 ? "SI" : "US") !== units && run("view.units"))}
          title={u === "SI" ? "SI units (kN, m, kPa)" : "US customary units (lbf, ft, psi)"}
          onClick={() => units !== u && run("view.units")}
          className={`h-6 rounded-[3px] px-2 font-medium pointer-coarse:h-full pointer-coarse:min-w-10 ${units === u ? "bg-ink text-paper" : "text-ink-soft hover:text-ink"}`}
        >
          {u}
        </button>
      ))}
    </div>
  );
}

/** The properties panel's toggle, for screens too narrow to show the panel beside the drawing. */
export interface PanelToggle {
  open: boolean;
  toggle: () => void;
}

/** Opens or closes a side panel that lies over the drawing on screens too narrow for it (`shownFrom` hides the button where the panel always shows). */
function PanelButton({ toggle, controls, name, text, shownFrom, testId }: { toggle: PanelToggle; controls: string; name?: string; text: string; shownFrom: string; testId: string }) {
  return (
    <button
      type="button"
      onClick={toggle.toggle}
      aria-expanded={toggle.open}
      aria-controls={controls}
      aria-label={name}
      className={`ml-2 h-7 whitespace-nowrap rounded border px-2.5 pointer-coarse:h-10 text-[12.5px] font-medium ${shownFrom} ${toggle.open ? "border-ink bg-ink text-paper" : "border-ink/20 text-ink hover:border-ink/45"}`}
      data-testid={testId}
    >
      {text}
    </button>
  );
}

export function Toolbar({
  where,
  saved,
  onOpenExample,
  extra,
  panel,
  tray,
}: {
  /** where the sketch is kept, given the title shown */
  where: (title: string) => string;
  saved: string | null;
  onOpenExample: (id: string) => void;
  extra?: ReactNode;
  /** the properties panel, a toggle below 1180 px */
  panel?: PanelToggle;
  /** the tray and the element list, a toggle on phone-width screens (below 640 px) */
  tray?: PanelToggle;
}) {
  const run = useActionRunner();
  const canUndo = useEditor((s) => s.past.length > 0);
  const canRedo = useEditor((s) => s.future.length > 0);
  const undoLabel = useEditor((s) => s.past[s.past.length - 1]?.label);
  const redoLabel = useEditor((s) => s.future[s.future.length - 1]?.label);
  const title = useEditor((s) => s.sketch.title);
  const scale = useEditor((s) => s.view.scale);
  const snap = useEditor((s) => s.snap);
  const units = useEditor((s) => s.units);
  // a sketch this reader may not change: nothing is offered that would replace or change it
  const readOnly = useEditor((s) => s.readOnly);
  const fileActions = menuActions("file").filter((a) => !readOnly || a.id.startsWith("file.export"));
  // what the page adds (a saved sketch's calc sheet): links, offered to readers as well
  // (the page's slot, `extra`, is inside this toolbar and registers them with useFileMenuLink)
  const fileLinks = useFileMenuLinkList();
  return (
    // below 1024 px (a tablet, a phone) the toolbar wraps rather than running off the side; on a
    // touch screen its controls are 40 px, a finger's tap target
    <header className="flex h-12 shrink-0 items-center gap-1 border-b border-rule bg-paper px-3 max-lg:h-auto max-lg:min-h-12 max-lg:flex-wrap max-lg:py-1.5">
      <Link href="/" className="mr-2 flex items-center gap-1.5 text-ink pointer-coarse:min-h-10 pointer-coarse:min-w-10" aria-label="Counterpoise home">
        <ProductMark size={22} />
      </Link>
      {/* which sketch this is stays readable: up to 22rem on wide screens, at least 7rem on narrow
          ones (the menus and buttons take short words there), a row of its own on a phone */}
      <div className="mr-3 min-w-[7rem] max-w-[22rem] shrink max-xl:max-w-[13rem] max-sm:order-last max-sm:mr-0 max-sm:max-w-none max-sm:basis-full max-sm:pt-1">
        <h1 className="truncate text-[13.5px] font-semibold leading-tight text-ink" data-testid="sketch-title">
          {title || "Untitled sketch"}
        </h1>
        <p className="truncate text-[11px] leading-tight text-ink-faint" aria-live="polite">
          {where(title || "")}
          {saved ? ` · saved ${saved}` : ""}
        </p>
      </div>
      <Menu label="File" testId="menu-file" items={[...menuItems(fileActions, run), ...fileLinks.links.map((l) => ({ id: l.id, label: l.label, detail: l.detail, href: l.href, onSelect: l.onSelect }))]} />
      {readOnly ? null : (
        <Menu
          label="Open an example"
          shortLabel="Example"
          testId="menu-examples"
          wide
          items={EXAMPLES.map((e) => ({ id: `example-${e.id}`, label: e.title, detail: e.summary, onSelect: () => onOpenExample(e.id) }))}
        />
      )}
      <div className="mx-2 h-5 w-px bg-rule" aria-hidden="true" />
      <button type="button" className={ICON_BUTTON} disabled={!canUndo} onClick={() => run("edit.undo")} title={canUndo ? actionTitle("edit.undo", `Undo: ${undoLabel}`) : "Nothing to undo"} aria-label="Undo" data-testid="undo">
        <svg width="16" height="16" viewBox="0 0 16 16" aria-hidden="true"><path d="M5 4L2 7l3 3M2.5 7H10a3.5 3.5 0 010 7H7" fill="none" stroke="currentColor" strokeWidth="1.5" strokeLinecap="round" strokeLinejoin="round" /></svg>
      </button>
      <button type="button" className={ICON_BUTTON} disabled={!canRedo} onClick={() => run("edit.redo")} title={canRedo ? actionTitle("edit.redo", `Redo: ${redoLabel}`) : "Nothing to redo"} aria-label="Redo" data-testid="redo">
        <svg width="16" height="16" viewBox="0 0 16 16" aria-hidden="true"><path d="M11 4l3 3-3 3M13.5 7H6a3.5 3.5 0 000 7h3" fill="none" stroke="currentColor" strokeWidth="1.5" strokeLinecap="round" strokeLinejoin="round" /></svg>
      </button>
      <div className="flex-1" />
      <button type="button" className={`${ICON_BUTTON} max-lg:hidden`} onClick={() => run("view.zoomOut")} aria-label="Zoom out" title={actionTitle("view.zoomOut")}>
        −
      </button>
      <span className="num w-16 text-center text-[11.5px] text-ink-faint max-lg:hidden" title="Drawing scale" aria-label="Drawing scale">
        {drawingScale(scale, units)}
      </span>
      <button type="button" className={`${ICON_BUTTON} max-lg:hidden`} onClick={() => run("view.zoomIn")} aria-label="Zoom in" title={actionTitle("view.zoomIn")}>
        +
      </button>
      <button type="button" className={`${ICON_BUTTON} text-[12px]`} onClick={() => run("view.fit")} title={actionTitle("view.fit")}>
        Fit
      </button>
      <button type="button" className={`${ICON_BUTTON} text-[13px] font-semibold max-sm:hidden`} onClick={() => run("view.keys")} aria-label="Keys and gestures" title={actionTitle("view.keys")} data-testid="show-keys">
        ?
      </button>
      <label className="ml-2 flex items-center gap-1.5 text-[12px] text-ink-soft pointer-coarse:min-h-10 pointer-coarse:min-w-10 pointer-coarse:justify-center" title="Snap to the grid and to body corners and edges (hold Alt to place freely)">
        <input type="checkbox" checked={snap} onChange={() => run("view.snap")} className="accent-accent" />
        {/* narrow toolbars have no room for the word: a dot grid with a point caught on it says it */}
        <svg width="14" height="14" viewBox="0 0 14 14" aria-hidden="true" className="lg:hidden" data-testid="snap-icon">
          {[2, 7, 12].flatMap((x) => [2, 7, 12].map((y) => <circle key={`${x}-${y}`} cx={x} cy={y} r={0.9} fill="currentColor" />))}
          <circle cx={7} cy={7} r={2.6} fill="none" stroke="currentColor" strokeWidth={1.3} />
        </svg>
        <span className="max-lg:sr-only">Snap</span>
      </label>
      <div className="ml-3">
        <UnitSwitch />
      </div>
      {/* the page's own controls (the version bar), in the toolbar's flow */}
      <div className="contents" data-toolbar-extra="">
        <FileMenuLinksProvider value={fileLinks}>{extra}</FileMenuLinksProvider>
      </div>
      {tray ? <PanelButton toggle={tray} controls="tray-panel" name="Add and elements" text="Add" shownFrom="sm:hidden" testId="toggle-tray" /> : null}
      {panel ? <PanelButton toggle={panel} controls="properties-panel" text="Properties" shownFrom="min-[1180px]:hidden" testId="toggle-properties" /> : null}
      {/* a phone's toolbar wraps: the keys-and-gestures list goes last there, after the panels */}
      <button type="button" className={`${ICON_BUTTON} text-[13px] font-semibold sm:hidden`} onClick={() => run("view.keys")} aria-label="Keys and gestures" title={actionTitle("view.keys")} data-testid="show-keys-narrow">
        ?
      </button>
    </header>
  );
}
