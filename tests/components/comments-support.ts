// The comments panel's props as a version's page passes them, for the comment component tests:
// Chen reads version 1, with nothing pinned or selected.
import type { ComponentProps } from "react";
import type { CommentsPanel } from "@/components/review/Comments";

type PanelProps = ComponentProps<typeof CommentsPanel>;

export function commentsPanelProps(data: PanelProps["data"], over: Partial<PanelProps> = {}): PanelProps {
  return {
    data,
    commentsPath: "/api/sketches/s1/versions/1/comments",
    viewerId: "u-chen",
    labels: {},
    pin: null,
    picking: false,
    onPicking: () => {},
    onClearPin: () => {},
    onPin: () => {},
    selected: null,
    onSelect: () => {},
    onChanged: () => {},
    versionHref: (n: number) => `/v/${n}`,
    ...over,
  };
}
