import "@testing-library/jest-dom/vitest";
import "vitest-canvas-mock";
import { cleanup } from "@testing-library/react";
import { afterEach, beforeEach, vi } from "vitest";
import { resetNavigation } from "./navigation";

// next/navigation for every component test, in one place (tests/support/navigation.ts): import
// `router`, `setSearch` or `setPathname` from there to look at or steer it.
vi.mock("next/navigation", async () => (await import("./navigation")).nextNavigation);
beforeEach(() => resetNavigation());

// Each test starts from a fresh browser: a unit choice or a scratch sketch kept in local storage
// (or an undo history kept in the tab's session storage) by one test must not leak into the next.
afterEach(() => {
  cleanup();
  window.localStorage.clear();
  window.sessionStorage.clear();
});
