// A version as the history lists it, for the version history's tests.
import type { VersionItem } from "@/components/versions/VersionHistory";

export const versionItem = (number: number, message: string): VersionItem => ({
  id: `v${number}`,
  number,
  message,
  authorId: "u1",
  authorName: "Eddie Editor",
  createdAt: "2026-12-01T09:00:00Z",
  status: "holds",
  largestReaction: 1200,
  warnings: [],
  reviewState: "draft",
});
