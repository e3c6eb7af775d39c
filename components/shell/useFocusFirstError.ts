// After a refused submit, the keyboard and a screen reader go to the first field in error: its
// label, its message (aria-describedby) and aria-invalid are read out there, rather than nothing
// being said while the focus stays on the button.
import { useEffect } from "react";

/** `errors` by field key (a new object each time the form is checked); `idOf` gives a key's input id. */
export function useFocusFirstError(errors: Readonly<Record<string, string | undefined>>, idOf: (key: string) => string = (k) => k): void {
  useEffect(() => {
    const first = Object.entries(errors).find(([, message]) => message);
    if (first) document.getElementById(idOf(first[0]))?.focus();
    // idOf is a plain mapping; only a new set of errors moves the focus
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [errors]);
}
