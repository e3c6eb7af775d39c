// What the sign-in, sign-up and password forms say for a refusal. The auth route answers a
// database out of reach itself (503 with the app's error object only, no better-auth code or
// message): the form says the server is busy and nothing changed, not "Something went wrong".
import { describe, expect, it } from "vitest";
import { authErrorMessage } from "@/components/auth/messages";

const BUSY = "The server is busy and could not reach its database in time. Nothing was changed: try again in a few seconds.";

describe("authErrorMessage", () => {
  it("a 503 from the auth route says the server's own words (as the client gets it: the JSON body beside status and statusText)", () => {
    expect(authErrorMessage({ status: 503, statusText: "Service Unavailable", error: { code: "unavailable", message: BUSY } } as never)).toBe(BUSY);
  });

  it("a 503 without a body still says busy, not a generic failure", () => {
    expect(authErrorMessage({ status: 503 })).toBe("The server is busy. Nothing was changed: try again in a few seconds.");
  });

  it("a refusal with only the app's error object (a request too large, another site) says its message", () => {
    expect(authErrorMessage({ status: 413, error: { message: "The request body is larger than the 64 KB the sign-in endpoints accept." } })).toBe(
      "The request body is larger than the 64 KB the sign-in endpoints accept.",
    );
  });

  it("the known codes keep their own words: wrong password or unknown address alike, and the budget spent", () => {
    expect(authErrorMessage({ status: 401, code: "INVALID_EMAIL_OR_PASSWORD", message: "Invalid email or password", error: { message: "Invalid email or password" } })).toBe(
      "That e-mail address and password do not match an account.",
    );
    expect(authErrorMessage({ status: 429 }, { retryAfter: 42 })).toBe("Too many attempts from this connection. Wait 42 seconds and try again.");
  });
});
