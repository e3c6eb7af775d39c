// A comment is posted once however fast the button is clicked: a second submit while the first is
// on its way (before the button can show itself busy) is dropped, and the next one after it goes.
import { renderHook } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { useOneAtATime } from "@/components/review/Comments";

type Opts = { onSettled?: () => void };

describe("a mutation that runs once at a time", () => {
  it("drops a second mutate while the first is on its way, and takes the next one once it settles", () => {
    const calls: Array<{ vars: string; opts?: Opts }> = [];
    const stub = { mutate: (vars: string, opts?: Opts) => void calls.push({ vars, opts }), isPending: false };
    const { result } = renderHook(() => useOneAtATime(stub as unknown as { mutate: (vars: never, opts?: never) => void; isPending: boolean }));
    const mutate = result.current.mutate as unknown as (vars: string, opts?: Opts) => void;
    let settled = 0;
    mutate("first", { onSettled: () => settled++ });
    mutate("double-click"); // the same click's twin: dropped
    expect(calls.map((c) => c.vars)).toEqual(["first"]);
    // the request ends (success or failure): the caller's own onSettled still runs
    calls[0].opts!.onSettled!();
    expect(settled).toBe(1);
    mutate("next comment");
    expect(calls.map((c) => c.vars)).toEqual(["first", "next comment"]);
    // everything else of the mutation (its busy state) passes through
    expect(result.current.isPending).toBe(false);
  });
});
