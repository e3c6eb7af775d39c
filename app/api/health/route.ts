import { pool } from "@/db";
import { otherMethods } from "@/lib/api";

export const dynamic = "force-dynamic";

/** Liveness of the app and its database: 200 `{ ok, db: "up" }`, or 503 with a message. */
export async function GET() {
  try {
    await pool.query("select 1");
    return Response.json({ ok: true, db: "up" });
  } catch (err) {
    const reason = err instanceof Error && "code" in err ? String((err as { code: unknown }).code) : "unreachable";
    return Response.json(
      { ok: false, db: "down", message: `The database is not answering (${reason}). Start it with \`npm start\` or check DATABASE_URL.` },
      { status: 503 },
    );
  }
}

export const { POST, PUT, PATCH, DELETE, OPTIONS } = otherMethods("GET");
