import { compareAsked, parseWorkspacePath, versionPageAsked } from "@/lib/workspace-path";

const W = "6d656d6f-0000-4000-8000-000000000001";
const S = "6d656d6f-0000-4000-8000-0000000000a1";

describe("what a workspace page's address names (checked before the page streams, so a miss answers 404)", () => {
  it("reads the workspace, the sketch and the versions from the path", () => {
    expect(parseWorkspacePath(`/workspaces/${W}`)).toEqual({ workspaceId: W });
    expect(parseWorkspacePath(`/workspaces/${W}/members`)).toEqual({ workspaceId: W });
    expect(parseWorkspacePath(`/workspaces/${W}/sketches/${S}`)).toEqual({ workspaceId: W, sketchId: S });
    const version = parseWorkspacePath(`/workspaces/${W}/sketches/${S}/versions/9`);
    expect(version?.sketchId).toBe(S);
    expect(version?.versions?.here).toBe("Version 9");
    expect(version?.versions?.missing(3)).toEqual(["9"]);
    expect(version?.versions?.missing(9)).toEqual([]);
  });

  it("is not a workspace page: the list, another area, an address that does not parse", () => {
    expect(parseWorkspacePath("/workspaces")).toBeNull();
    expect(parseWorkspacePath(`/sketches/${S}`)).toBeNull();
    expect(parseWorkspacePath("/account")).toBeNull();
  });

  it("a version number the sketch does not have, as written", () => {
    for (const bad of ["0", "-1", "1.5", "abc", "4"]) expect(versionPageAsked(bad).missing(3)).toEqual([bad]);
    for (const good of ["1", "3"]) expect(versionPageAsked(good).missing(3)).toEqual([]);
  });

  it("compare: defaults to the last two, draft is always there, each bad number named once as written", () => {
    const plain = compareAsked({});
    expect([plain.from(3), plain.to(3), plain.missing(3)]).toEqual([2, 3, []]);
    expect([plain.from(1), plain.to(1), plain.missing(1)]).toEqual([1, 1, []]);
    expect(compareAsked({ to: "draft" }).missing(1)).toEqual([]);
    expect(compareAsked({ from: "abc", to: "7" }).missing(2)).toEqual(["abc", "7"]);
    expect(compareAsked({ from: "", to: "" }).missing(2)).toEqual([]);
    expect(compareAsked({ from: ["9", "1"] }).missing(2)).toEqual(["9"]);
    const viaPath = parseWorkspacePath(`/workspaces/${W}/sketches/${S}/compare?from=abc&to=7&drawings=overlay`);
    expect(viaPath?.versions?.here).toBe("Compare");
    expect(viaPath?.versions?.missing(2)).toEqual(["abc", "7"]);
  });
});
