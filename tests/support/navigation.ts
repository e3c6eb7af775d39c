// next/navigation for the component tests: tests/support/setup-dom.ts mocks the module with these
// for every file, and resets them before each test. A test that looks at where the app went
// imports `router` (its methods are vi.fn()). `useSearchParams` and `usePathname` read the test's
// address (window.location) unless a test sets them with `setSearch` / `setPathname`.
import { vi } from "vitest";

export const router = { push: vi.fn(), replace: vi.fn(), refresh: vi.fn(), back: vi.fn(), forward: vi.fn(), prefetch: vi.fn() };

// null: read from the test's address (window.location), as the app's pages do; set: that instead
const state: { search: URLSearchParams | null; pathname: string | null } = { search: null, pathname: null };
// the address's query as last read, so a render that finds it unchanged gets the same object (as
// Next's does: an effect that depends on it does not run again for nothing)
let read: { query: string; params: URLSearchParams } = { query: "", params: new URLSearchParams() };

function searchParams(): URLSearchParams {
  if (state.search) return state.search;
  if (read.query !== window.location.search) read = { query: window.location.search, params: new URLSearchParams(window.location.search) };
  return read.params;
}

/** The query `useSearchParams()` answers from now on, whatever the address ("a=1&b=2", with or without the "?"). */
export function setSearch(query: string): void {
  state.search = new URLSearchParams(query);
}

/** The path `usePathname()` answers from now on, whatever the address. */
export function setPathname(path: string): void {
  state.pathname = path;
}

/** Back to reading the address, and routers with no calls and no implementations (before each test). */
export function resetNavigation(): void {
  for (const fn of Object.values(router)) fn.mockReset();
  state.search = null;
  state.pathname = null;
}

/** The module as the components see it. `redirect` and `notFound` throw as Next's do, so nothing after them renders. */
export const nextNavigation = {
  useRouter: () => router,
  useSearchParams: searchParams,
  usePathname: () => state.pathname ?? window.location.pathname,
  useParams: () => ({}),
  redirect: (to: string): never => {
    throw new Error(`NEXT_REDIRECT ${to}`);
  },
  permanentRedirect: (to: string): never => {
    throw new Error(`NEXT_REDIRECT ${to}`);
  },
  notFound: (): never => {
    throw new Error("NEXT_NOT_FOUND");
  },
};
