// The account page's "Recent account activity": each event in the person's own words with the
// browser that made a sign-in or sign-out, its time (UTC) and address, in the order given (newest
// first), the sign-in that started the session looking at it marked "This device"; an account with
// none says what will be listed.
import { render, screen, within } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { AccountActivity } from "@/components/auth/AccountActivity";
import type { AccountActivityEntry } from "@/lib/account-activity";

const base = { userAgent: null, ip: null, from: null, to: null, signedOutOthers: false, thisDevice: false };
const EVENTS: AccountActivityEntry[] = [
  { ...base, id: 9, at: "2026-03-06T10:15:00Z", action: "auth.email_change", from: "ada@old.example", to: "ada@new.example" },
  { ...base, id: 8, at: "2026-03-06T09:00:00Z", action: "auth.password_change", signedOutOthers: true },
  { ...base, id: 7, at: "2026-03-05T18:40:00Z", action: "auth.sign_out_all" },
  { ...base, id: 6, at: "2026-03-05T18:30:00Z", action: "auth.sign_out_others" },
  { ...base, id: 5, at: "2026-03-05T17:00:00Z", action: "auth.sign_out", userAgent: "Mozilla/5.0 (iPhone; CPU iPhone OS 17_4 like Mac OS X) Version/17.4 Mobile Safari/604.1", ip: "198.51.100.7" },
  { ...base, id: 4, at: "2026-03-04T08:00:00Z", action: "auth.sign_in", userAgent: "Mozilla/5.0 (Windows NT 10.0; Win64; x64; rv:126.0) Gecko/20100101 Firefox/126.0", ip: "203.0.113.5" },
  { ...base, id: 3, at: "2026-03-03T07:00:00Z", action: "auth.sign_in" },
  { ...base, id: 2, at: "2026-03-02T07:00:00Z", action: "auth.password_reset" },
  { ...base, id: 1, at: "2026-03-01T07:00:00Z", action: "auth.password_change" },
];

describe("recent account activity", () => {
  it("says each event, with its device, time and address, newest first as given", () => {
    render(<AccountActivity events={EVENTS} />);
    const rows = within(screen.getByRole("list", { name: "Recent account activity" })).getAllByRole("listitem");
    expect(rows.map((r) => r.textContent)).toEqual([
      "Changed the sign-in address from ada@old.example to ada@new.example6 Mar 2026, 10:15 UTC",
      "Changed the password and signed out every other device6 Mar 2026, 09:00 UTC",
      "Signed out everywhere5 Mar 2026, 18:40 UTC",
      "Signed out every other device5 Mar 2026, 18:30 UTC",
      "Signed out on Safari on iOS5 Mar 2026, 17:00 UTC from 198.51.100.7",
      "Signed in on Firefox on Windows4 Mar 2026, 08:00 UTC from 203.0.113.5",
      "Signed in3 Mar 2026, 07:00 UTC",
      "Reset the password through a mailed link2 Mar 2026, 07:00 UTC",
      "Changed the password1 Mar 2026, 07:00 UTC",
    ]);
    expect(rows[0].querySelector("time")?.getAttribute("dateTime")).toBe("2026-03-06T10:15:00Z");
  });

  it("marks the sign-in that started this session \"This device\", and only that one", () => {
    const events = EVENTS.map((e) => (e.id === 4 ? { ...e, thisDevice: true } : e));
    render(<AccountActivity events={events} />);
    const rows = within(screen.getByRole("list", { name: "Recent account activity" })).getAllByRole("listitem");
    expect(rows[5].textContent).toBe("Signed in on Firefox on WindowsThis device4 Mar 2026, 08:00 UTC from 203.0.113.5");
    expect(within(rows[5]).getByText("This device")).toBeTruthy();
    expect(screen.getAllByText("This device")).toHaveLength(1);
    // the other sign-in (same words, another session) carries no mark
    expect(rows[6].textContent).toBe("Signed in3 Mar 2026, 07:00 UTC");
  });

  it("with no events, says what will be listed and shows no empty list", () => {
    render(<AccountActivity events={[]} />);
    expect(screen.getByText("No account activity yet. Sign-ins, sign-outs and changes of password or address will be listed here.")).toBeTruthy();
    expect(screen.queryByRole("list")).toBeNull();
  });
});
