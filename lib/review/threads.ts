// A version's comments as threads: each first comment with its replies, oldest first. A deleted
// first comment with no replies left is gone for good. Pure: the review screen's reader and the
// calc sheet's check record number the threads the same way.
export function threadsOf<C extends { id: string; parentId: string | null; deletedAt: Date | null }>(comments: readonly C[]): Array<{ first: C; all: C[] }> {
  return comments
    .filter((c) => c.parentId === null)
    .map((first) => ({ first, all: [first, ...comments.filter((c) => c.parentId === first.id)] }))
    .filter((t) => !(t.all.length === 1 && t.first.deletedAt));
}
