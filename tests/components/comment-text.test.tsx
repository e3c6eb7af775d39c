// Comment text renders inert: no HTML from the text, no links but http(s), light formatting
// and mentions as plain React elements.
import { render } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { CommentText } from "@/components/review/CommentText";
import { findMentions, parseComment, safeHref } from "@/lib/review/comment-text";

const members = [
  { id: "u1", name: "Chen Checker" },
  { id: "u2", name: "Eddie Editor" },
  { id: "u3", name: "Eddie Other" },
];

describe("comment text", () => {
  it("shows <script> and HTML as text, and runs nothing", () => {
    const text = `<script>window.pwned = 1</script><img src=x onerror="window.pwned=2"><b>not bold</b>`;
    const { container } = render(<CommentText text={text} />);
    expect(container.querySelector("script")).toBeNull();
    expect(container.querySelector("img")).toBeNull();
    expect(container.querySelector("b")).toBeNull();
    expect(container.textContent).toBe(text);
    expect((window as unknown as { pwned?: number }).pwned).toBeUndefined();
  });

  it("leaves markdown-looking links as text: no javascript: or data: link, ever", () => {
    const text = "[click me](javascript:alert(1)) and [pic](data:text/html,<script>alert(1)</script>) and [site](https://example.com/a)";
    const { container } = render(<CommentText text={text} />);
    const links = [...container.querySelectorAll("a")];
    expect(links.map((a) => a.getAttribute("href"))).toEqual(["https://example.com/a"]);
    expect(links[0].textContent).toBe("https://example.com/a");
    expect(links[0].getAttribute("rel")).toBe("noopener noreferrer nofollow");
    expect(container.textContent).toBe(text);
    expect(container.innerHTML).not.toContain('href="javascript');
    expect(container.innerHTML).not.toContain('href="data');
  });

  it("formats bold, italics, code, line breaks and web addresses", () => {
    const { container } = render(<CommentText text={"**Lift-off** at the *rear* pad: see `margin`\nhttps://example.com/check, then _recheck_."} />);
    expect(container.querySelector("strong")?.textContent).toBe("Lift-off");
    expect([...container.querySelectorAll("em")].map((e) => e.textContent)).toEqual(["rear", "recheck"]);
    expect(container.querySelector("code")?.textContent).toBe("margin");
    expect(container.querySelectorAll("br")).toHaveLength(1);
    expect(container.querySelector("a")?.getAttribute("href")).toBe("https://example.com/check");
  });

  it("takes italics inside bold, with either mark", () => {
    const { container } = render(<CommentText text={"**Check *both* feet** and **the _front_ one**"} />);
    expect([...container.querySelectorAll("strong")].map((e) => e.textContent)).toEqual(["Check both feet", "the front one"]);
    expect([...container.querySelectorAll("strong em")].map((e) => e.textContent)).toEqual(["both", "front"]);
    expect(container.textContent).toBe("Check both feet and the front one");
  });

  it("keeps snake_case and arithmetic as they are", () => {
    const lines = parseComment("p_in * 2 and rho_water * g * h");
    expect(lines[0]).toEqual([{ t: "text", text: "p_in * 2 and rho_water * g * h" }]);
  });

  it("finds @mentions by full name, or by a first name only one member has", () => {
    const found = findMentions("@Chen please, and @eddie editor; @Eddie alone is ambiguous; mail chen@example.com", members);
    expect(found.map((f) => f.userId)).toEqual(["u1", "u2"]);
    const { container } = render(<CommentText text="Over to you @Chen." members={members} />);
    expect(container.querySelector("[data-mention]")?.textContent).toBe("@Chen");
  });

  it("links bare www. addresses as https, with the same trimming", () => {
    const { container } = render(<CommentText text={"See www.example.org/check?a=1. Or (www.example.com), or WWW.Example.net!"} />);
    const links = [...container.querySelectorAll("a")];
    expect(links.map((a) => a.getAttribute("href"))).toEqual(["https://www.example.org/check?a=1", "https://www.example.com/", "https://www.example.net/"]);
    expect(links.map((a) => a.textContent)).toEqual(["www.example.org/check?a=1", "www.example.com", "WWW.Example.net"]);
    expect(links[0].getAttribute("rel")).toBe("noopener noreferrer nofollow");
    expect(container.textContent).toBe("See www.example.org/check?a=1. Or (www.example.com), or WWW.Example.net!");
  });

  it("leaves www. as text inside other words, hosts, e-mail addresses and other schemes", () => {
    const text = "mail ops@www.example.org, cdn.www.example.org, notwww.example.org, ftp://www.example.org, www. alone, www.example, www.example.org@evil.example";
    const { container } = render(<CommentText text={text} />);
    expect(container.querySelectorAll("a")).toHaveLength(0);
    expect(container.textContent).toBe(text);
    // an https address keeps one link, not a second one for its www. part
    const lines = parseComment("https://www.example.org/a");
    expect(lines[0]).toEqual([{ t: "link", href: "https://www.example.org/a", text: "https://www.example.org/a" }]);
  });

  it("accepts only http and https addresses as links", () => {
    expect(safeHref("https://ok.example/x")).toBe("https://ok.example/x");
    expect(safeHref("javascript:alert(1)")).toBeNull();
    expect(safeHref("ftp://files.example")).toBeNull();
  });
});
