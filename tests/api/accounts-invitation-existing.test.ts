// Signing up from an invitation when the invited address already has an account (made since the
// mail was sent, or in another tab): the refusal gives the way on — sign in with that address,
// filled in, and come back to the invitation to join — and the invitation stays open for it.
import { beforeAll, describe, expect, it } from "vitest";
import * as signUpRoute from "@/app/api/invitations/[token]/sign-up/route";
import * as invitationsRoute from "@/app/api/workspaces/[id]/invitations/route";
import { lookUpInvitation } from "@/lib/invitations";
import { invitationTokenOf, call, withMailFake, makeAccount, makeWorkspace, uniqueEmail, type Person } from "./helpers";


describe("invitation sign-up for an address that already has an account", () => {
  let owner: Person;
  let ws: string;

  withMailFake();
  beforeAll(async () => {
    owner = await makeAccount("inv-existing-owner");
    ws = await makeWorkspace("Quay Pump House", [[owner, "owner"]]);
  });

  it("answers 409 naming the address and the sign-in page that comes back to the invitation", async () => {
    const invitee = await makeAccount("inv-existing-invitee", { signIn: false });
    const sent = await call(invitationsRoute.POST, { method: "POST", params: { id: ws }, cookie: owner.cookie, body: { email: invitee.email, role: "editor" } });
    expect(sent.status).toBe(201);
    const token = invitationTokenOf(sent.body.invitation.url);

    const res = await call(signUpRoute.POST, { method: "POST", params: { token }, body: { name: "Second Try", password: "another-password-2" } });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe("conflict");
    expect(res.body.error.message).toBe(`An account for ${invitee.email} already exists. Sign in with it to accept the invitation.`);
    expect(res.body.error.signIn).toBe(`/sign-in?next=${encodeURIComponent(`/invite/${token}`)}&email=${encodeURIComponent(invitee.email)}`);
    // no session was made for the person holding the link
    expect(res.res.headers.getSetCookie()).toEqual([]);
    // the invitation is still open for the sign-in to accept
    expect((await lookUpInvitation(token))?.status).toBe("pending");
  });

  it("a new address still signs up and joins (the refusal is only for an existing account)", async () => {
    const email = uniqueEmail("inv-existing-new");
    const sent = await call(invitationsRoute.POST, { method: "POST", params: { id: ws }, cookie: owner.cookie, body: { email, role: "viewer" } });
    const res = await call(signUpRoute.POST, { method: "POST", params: { token: invitationTokenOf(sent.body.invitation.url) }, body: { name: "New Person", password: "new-password-3" } });
    expect(res.status).toBe(201);
    expect(res.body.workspaceId).toBe(ws);
  });
});
