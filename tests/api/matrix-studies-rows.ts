// The authorization matrix's rows for the studies routes: the calc sheet of a version.
import { call } from "./helpers";
import { members, type Row } from "./matrix-types";

export const STUDIES_ROWS: Record<string, Row> = {
  "GET /api/sketches/[id]/versions/[number]/calc-sheet": {
    expect: members(200),
    run: (h, f, p) => call(h, { params: { id: f.sketchId, number: "1" }, cookie: p.cookie }),
  },
};
