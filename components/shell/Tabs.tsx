"use client";
// The keyboard of a row of tabs (WAI-ARIA Authoring Practices, "Tabs" pattern): one Tab stop, the
// selected tab; Left and Right move between the tabs (wrapping), Home and End to the first and the
// last. Each tab names its panel and the panel is labelled by its tab.
import { useId, type KeyboardEvent } from "react";

/**
 * `automatic`: an arrow key selects the tab it moves to (the panels are quick to show and lose
 * nothing). `manual`: the arrows move the focus only and Enter or Space selects (a panel that would
 * throw away work, or is slow, when the keyboard merely passes over its tab).
 */
export type TabActivation = "automatic" | "manual";

export function useTabList<T extends string>({ tabs, selected, onSelect, activation = "automatic" }: { tabs: readonly T[]; selected: T; onSelect: (id: T) => void; activation?: TabActivation }) {
  const base = useId();
  const tabId = (id: T) => `${base}tab-${id}`;
  const panelId = (id: T) => `${base}panel-${id}`;
  const onKeyDown = (index: number) => (e: KeyboardEvent<HTMLElement>) => {
    const n = tabs.length;
    const next = e.key === "ArrowRight" ? (index + 1) % n : e.key === "ArrowLeft" ? (index - 1 + n) % n : e.key === "Home" ? 0 : e.key === "End" ? n - 1 : -1;
    if (next < 0 || e.altKey || e.ctrlKey || e.metaKey) return;
    e.preventDefault();
    if (activation === "automatic") onSelect(tabs[next]);
    document.getElementById(tabId(tabs[next]))?.focus();
  };
  return {
    /** on the element holding the tabs; `label` names the row */
    listProps: (label: string) => ({ role: "tablist" as const, "aria-label": label, "aria-orientation": "horizontal" as const }),
    /** on each tab (a button) */
    tabProps: (id: T) => {
      const on = id === selected;
      return {
        type: "button" as const,
        role: "tab" as const,
        id: tabId(id),
        "aria-selected": on,
        // only the shown panel is on the page: the tabs not selected name none
        "aria-controls": on ? panelId(id) : undefined,
        tabIndex: on ? 0 : -1,
        onClick: () => onSelect(id),
        onKeyDown: onKeyDown(tabs.indexOf(id)),
      };
    },
    /** on the selected tab's panel */
    panelProps: () => ({ role: "tabpanel" as const, id: panelId(selected), "aria-labelledby": tabId(selected), tabIndex: 0 }),
  };
}
