"use client";
// Links the page around the editor adds to its File menu: a saved sketch's calc sheet, whose
// toolbar button has no room below 1280 px, is still one tap away there on a tablet or a phone.
// Whatever the page puts in the toolbar's slot registers them with `useFileMenuLink`, so the
// link and the menu item are made from the same href.
import { createContext, useCallback, useContext, useEffect, useMemo, useRef, useState } from "react";

export interface FileMenuLink {
  id: string;
  label: string;
  /** a link (the calc sheet), or else an action (`onSelect`: making an older version the latest again) */
  href?: string;
  onSelect?: () => void;
  /** longer words under the label */
  detail?: string;
}

type Put = (id: string, link: FileMenuLink | null) => void;

const FileMenuLinksCtx = createContext<{ links: FileMenuLink[]; put: Put } | null>(null);

/** The editor's list of page links, for its toolbar and the page's slot inside it. */
export function useFileMenuLinkList(): { links: FileMenuLink[]; put: Put } {
  const [links, setLinks] = useState<FileMenuLink[]>([]);
  const put = useCallback<Put>((id, link) => {
    setLinks((now) => {
      const at = now.findIndex((l) => l.id === id);
      if (!link) return at < 0 ? now : now.filter((l) => l.id !== id);
      const old = now[at];
      if (old && old.label === link.label && old.href === link.href && old.detail === link.detail && !!old.onSelect === !!link.onSelect) return now;
      return at < 0 ? [...now, { ...link, id }] : now.map((l, i) => (i === at ? { ...link, id } : l));
    });
  }, []);
  return useMemo(() => ({ links, put }), [links, put]);
}

export const FileMenuLinksProvider = FileMenuLinksCtx.Provider;

/** The links added to the File menu (none outside an editor). */
export function useFileMenuLinks(): FileMenuLink[] {
  return useContext(FileMenuLinksCtx)?.links ?? [];
}

/**
 * Offer `link` in the editor's File menu while the calling component is mounted (null: not now).
 * Outside an editor it does nothing.
 */
export function useFileMenuLink(id: string, link: Omit<FileMenuLink, "id"> | null): void {
  const put = useContext(FileMenuLinksCtx)?.put;
  const label = link?.label;
  const href = link?.href;
  const detail = link?.detail;
  // the latest action, called through one stable function (a new closure each render changes nothing)
  const action = useRef(link?.onSelect);
  useEffect(() => {
    action.current = link?.onSelect;
  });
  const acts = !!link?.onSelect;
  useEffect(() => {
    if (!put) return;
    const onSelect = acts ? () => action.current?.() : undefined;
    put(id, label !== undefined && (href !== undefined || onSelect) ? { id, label, href, detail, onSelect } : null);
  }, [put, id, label, href, detail, acts]);
  useEffect(() => (put ? () => put(id, null) : undefined), [put, id]);
}
