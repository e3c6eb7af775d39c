// The account page's list of signed-in devices, read from the real session table: only this
// account's sessions that have not expired, the current one first; and signing out every other
// device through better-auth's route leaves exactly the current one.
import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db";
import { session } from "@/db/schema";
import { activeSessions } from "@/lib/account-sessions";
import { getAuth } from "@/lib/auth";
import { authPoster } from "./auth-setup";
import { sessionTokenOf, makeAccount, signIn } from "./helpers";

const post = authPoster("10.9.8.61");
const idOf = async (cookie: string) => (await db.select({ id: session.id }).from(session).where(eq(session.token, sessionTokenOf(cookie))))[0].id;

describe("activeSessions", () => {
  it("lists the account's live sessions, the current one first and marked; expired and other people's are left out", async () => {
    const ada = await makeAccount("devices-ada");
    const laptop = ada.cookie;
    const phone = await signIn(ada.email);
    const old = await signIn(ada.email);
    await db.update(session).set({ expiresAt: new Date(Date.now() - 60_000) }).where(eq(session.token, sessionTokenOf(old)));
    await makeAccount("devices-bob");

    const list = await activeSessions(ada.id, await idOf(laptop));
    expect(list).toHaveLength(2);
    expect(list.map((s) => s.current)).toEqual([true, false]);
    expect(list[0].id).toBe(await idOf(laptop));
    expect(list[1].id).toBe(await idOf(phone));
    // never the token itself: the page is HTML a script could read
    expect(JSON.stringify(list)).not.toContain(sessionTokenOf(laptop));
  });

  it("after 'sign out every other device', only the current session is left, and it still works", async () => {
    const cy = await makeAccount("devices-cy");
    await signIn(cy.email);
    await signIn(cy.email);
    expect(await activeSessions(cy.id, await idOf(cy.cookie))).toHaveLength(3);
    const res = await post("/revoke-other-sessions", {}, { cookie: cy.cookie });
    expect(res.status).toBe(200);
    const left = await activeSessions(cy.id, await idOf(cy.cookie));
    expect(left.map((s) => s.current)).toEqual([true]);
    const still = await getAuth().api.getSession({ headers: new Headers({ cookie: cy.cookie }) });
    expect(still?.user.email).toBe(cy.email);
  });
});
