// A page's view kept in its address, so a reload or a link sent to a colleague shows the same:
// one query parameter set or taken out, in place (no navigation, no history entry). Browser-only.

/** Set `key` to `value` in the address, or take it out when `value` is null. */
export function setAddressParam(key: string, value: string | null): void {
  const url = new URL(window.location.href);
  if (value === null) url.searchParams.delete(key);
  else url.searchParams.set(key, value);
  window.history.replaceState(window.history.state, "", url);
}
