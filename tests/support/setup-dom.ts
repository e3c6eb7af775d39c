import "@testing-library/jest-dom/vitest";
import "vitest-canvas-mock";
import { cleanup } from "@testing-library/react";
import { afterEach } from "vitest";

// Each test starts from a fresh browser: a unit choice or a scratch sketch kept in local storage
// (or an undo history kept in the tab's session storage) by one test must not leak into the next.
afterEach(() => {
  cleanup();
  window.localStorage.clear();
  window.sessionStorage.clear();
});
