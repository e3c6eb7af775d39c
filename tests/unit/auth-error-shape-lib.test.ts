// better-auth's refusals given the app's error object beside their own: a script reads
// `.error.code` / `.error.message` on every API address. What better-auth sent stays as it was.
import { describe, expect, it } from "vitest";
import { withAppErrorShape } from "@/lib/auth-error-shape";

const jsonRes = (body: unknown, status: number, headers: Record<string, string> = {}) =>
  new Response(JSON.stringify(body), { status, headers: { "content-type": "application/json", ...headers } });

describe("withAppErrorShape", () => {
  it("a 429 without a code becomes rate_limited, keeping Retry-After and better-auth's own message", async () => {
    const res = await withAppErrorShape(jsonRes({ message: "Too many requests. Please try again later." }, 429, { "retry-after": "7", "x-retry-after": "7" }));
    expect(res.status).toBe(429);
    expect(res.headers.get("retry-after")).toBe("7");
    expect(await res.json()).toEqual({
      message: "Too many requests. Please try again later.",
      error: { code: "rate_limited", message: "Too many requests. Please try again later." },
    });
  });

  it("names each field better-auth's message names", async () => {
    const message = "[body.email] Invalid email address; [body.password] Invalid input: expected string, received number";
    const res = await withAppErrorShape(jsonRes({ code: "VALIDATION_ERROR", message }, 400));
    expect((await res.json()).error).toEqual({
      code: "validation_error",
      message,
      fields: [
        { path: "email", message: "Invalid email address" },
        { path: "password", message: "Invalid input: expected string, received number" },
      ],
    });
  });

  it("keeps Set-Cookie on a refusal", async () => {
    const res = await withAppErrorShape(jsonRes({ code: "EMAIL_NOT_VERIFIED", message: "Email not verified" }, 403, { "set-cookie": "a=1; Path=/" }));
    expect(res.headers.get("set-cookie")).toBe("a=1; Path=/");
    expect((await res.json()).code).toBe("EMAIL_NOT_VERIFIED");
  });

  it("leaves successes, non-JSON answers and bodies that already have an error object as they are", async () => {
    const ok = jsonRes({ user: { id: "u1" } }, 200);
    expect(await withAppErrorShape(ok)).toBe(ok);
    const html = new Response("<p>no</p>", { status: 404, headers: { "content-type": "text/html" } });
    expect(await withAppErrorShape(html)).toBe(html);
    const ours = jsonRes({ error: { code: "payload_too_large", message: "Too large." } }, 413);
    expect(await withAppErrorShape(ours)).toBe(ours);
  });
});
