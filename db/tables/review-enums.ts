import { pgEnum } from "drizzle-orm/pg-core";

/**
 * Where a version stands in the sign-off: prepared (draft), submitted for checking, returned
 * with a comment, checked, approved, or its approval withdrawn. The rules live in lib/review/rules.ts.
 */
export const reviewState = pgEnum("review_state", ["draft", "submitted", "returned", "checked", "approved", "withdrawn"]);
export const signOffStep = pgEnum("sign_off_step", ["submit", "check", "return", "approve", "withdraw"]);
