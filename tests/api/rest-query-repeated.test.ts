// A query parameter sent twice (`?tag=pumps&tag=anchors`) is refused by name: the listing reads one
// tag, and answering with the last one alone would look like an AND filter that silently was not.
import { beforeAll, describe, expect, it } from "vitest";
import * as sketchesRoute from "@/app/api/workspaces/[id]/sketches/route";
import { call, makeAccount, makeWorkspace, type Person } from "./helpers";
import { postSketch } from "./sketch-setup";

let eddie: Person;
let ws: string;

beforeAll(async () => {
  eddie = await makeAccount("eddie");
  ws = await makeWorkspace("Repeats", [[eddie, "editor"]]);
  await postSketch(ws, eddie, "Bend", "pipe-bend-anchor", { tags: ["anchors"] });
});

describe("a query parameter given twice", () => {
  it("is a 400 naming it, not the last value read alone", async () => {
    const out = await call(sketchesRoute.GET, { params: { id: ws }, cookie: eddie.cookie, path: `/api/workspaces/${ws}/sketches?tag=pumps&tag=anchors` });
    expect(out.status).toBe(400);
    expect(out.body.error.fields).toEqual([{ path: "query.tag", message: "Is given 2 times: send it once." }]);
  });

  it("leaves a parameter given once alone", async () => {
    const out = await call(sketchesRoute.GET, { params: { id: ws }, cookie: eddie.cookie, path: `/api/workspaces/${ws}/sketches?tag=anchors&sort=title` });
    expect(out.status).toBe(200);
    expect(out.body.items.map((s: { title: string }) => s.title)).toEqual(["Bend"]);
  });
});
