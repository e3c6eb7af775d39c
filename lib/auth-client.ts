"use client";
// better-auth's browser client: same origin, so no base URL is needed.
import { inferAdditionalFields } from "better-auth/client/plugins";
import { createAuthClient } from "better-auth/react";

export const authClient = createAuthClient({
  plugins: [inferAdditionalFields({ user: { emailNotifications: { type: "boolean", required: false } } })],
});
