"use client";
// Where a fork came from: the origin sketch and the version forked, a link to that version for
// those who may read it (the sketch's page and each of its versions' pages say it).
import Link from "next/link";
import { ForkGlyph } from "./ForkGlyph";

export type ForkOrigin =
  | { visible: true; sketchId: string; title: string; workspaceId: string; versionNumber: number }
  | { visible: false; title: string | null; versionNumber: number }
  | { visible: false; deleted: true; title: string | null; versionNumber: number | null };

export function ForkedFrom({ origin }: { origin: ForkOrigin }) {
  if (origin.visible)
    return (
      <p className="text-sm text-ink-soft" data-testid="forked-from">
        <ForkGlyph /> Forked from{" "}
        <Link href={`/workspaces/${origin.workspaceId}/sketches/${origin.sketchId}/versions/${origin.versionNumber}`} className="font-medium text-ink underline decoration-rule underline-offset-2 hover:decoration-ink">
          {origin.title} v{origin.versionNumber}
        </Link>
      </p>
    );
  const named = `${origin.title ? `“${origin.title}”` : "a sketch"}${origin.versionNumber === null ? "" : ` v${origin.versionNumber}`}`;
  return (
    <p className="text-sm text-ink-soft" data-testid="forked-from">
      <ForkGlyph /> Forked from {named}
      {"deleted" in origin ? ", a sketch since deleted (this fork keeps its own copy)" : ", in a workspace you are not a member of"}
    </p>
  );
}
