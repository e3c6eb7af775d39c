// Comment text: plain text with light formatting — **bold**, *italic* or _italic_, `code`,
// line breaks, web addresses — and @mentions of workspace members. Parsed into tokens that the
// screen renders as React elements (never as HTML), so nothing in a comment can run. Markdown
// links are not a thing here: `[text](url)` stays text, and only http(s) addresses (and bare
// `www.` ones, as https) become links.
// Browser-safe.

export type Inline =
  | { t: "text"; text: string }
  | { t: "bold" | "italic"; children: Inline[] }
  | { t: "code"; text: string }
  | { t: "link"; href: string; text: string }
  | { t: "mention"; userId: string; text: string };

export type Member = { id: string; name: string };

export const MAX_COMMENT_LENGTH = 4000;

// A bare `www.` address must start a word (not the tail of a longer host, a path or an e-mail
// address) and have a dot after `www.`.
const URL_RE = /\bhttps?:\/\/[^\s<>"'`]+|(?<![\p{L}\p{N}._@/:-])www\.[\p{L}\p{N}-]+\.[^\s<>"'`]+/giu;

/** An address without the punctuation that usually ends the sentence around it. */
function trimUrl(url: string): string {
  let u = url.replace(/[.,;:!?]+$/, "");
  // a closing bracket belongs to the address only when it opened one
  while (/[)\]]$/.test(u) && (u.match(/[([]/g)?.length ?? 0) < (u.match(/[)\]]/g)?.length ?? 0)) u = u.slice(0, -1);
  return u;
}

/** Only http and https, parsed by the platform; anything else is not a link. */
export function safeHref(url: string): string | null {
  try {
    const u = new URL(url);
    return u.protocol === "http:" || u.protocol === "https:" ? u.href : null;
  } catch {
    return null;
  }
}

/** `www.example.org` as an https link; refused when it hides another host (`www.a.org@b.org`). */
function bareHref(url: string): string | null {
  const href = safeHref(`https://${url}`);
  if (!href) return null;
  const u = new URL(href);
  return u.username || u.password || !u.hostname.startsWith("www.") ? null : href;
}

type Found = { start: number; end: number; userId: string };

/** Who `@name` names: a member's full name, or a first name no other member shares (case-insensitive). */
export function findMentions(text: string, members: Member[]): Found[] {
  const lower = text.toLowerCase();
  const firstNames = new Map<string, Member[]>();
  for (const m of members) {
    const first = m.name.trim().split(/\s+/)[0]?.toLowerCase();
    if (first) firstNames.set(first, [...(firstNames.get(first) ?? []), m]);
  }
  const candidates: Array<{ key: string; id: string }> = [];
  for (const m of members) candidates.push({ key: m.name.trim().toLowerCase(), id: m.id });
  for (const [first, ms] of firstNames) if (ms.length === 1) candidates.push({ key: first, id: ms[0].id });
  candidates.sort((a, b) => b.key.length - a.key.length);

  const found: Found[] = [];
  for (let i = lower.indexOf("@"); i !== -1; i = lower.indexOf("@", i + 1)) {
    if (i > 0 && /[\p{L}\p{N}._-]/u.test(lower[i - 1])) continue; // an e-mail address, not a mention
    const hit = candidates.find((c) => c.key && lower.startsWith(c.key, i + 1) && !/[\p{L}\p{N}]/u.test(lower[i + 1 + c.key.length] ?? " "));
    if (hit) {
      found.push({ start: i, end: i + 1 + hit.key.length, userId: hit.id });
      i += hit.key.length;
    }
  }
  return found;
}

/** The user ids a text mentions, once each. */
export function mentionedIds(text: string, members: Member[]): string[] {
  return [...new Set(findMentions(text, members).map((f) => f.userId))];
}

/** **bold**, *italic*, _italic_ and `code` within a run of text that has no links or mentions. */
function emphasis(text: string): Inline[] {
  const out: Inline[] = [];
  const re = /`([^`\n]+)`|\*\*((?:[^*\n]|\*(?!\*))+?)\*\*|\*([^*\s][^*\n]*?)\*|(?<![\p{L}\p{N}])_([^_\s][^_\n]*?)_(?![\p{L}\p{N}])/gu;
  let last = 0;
  for (const m of text.matchAll(re)) {
    if (m.index! > last) out.push({ t: "text", text: text.slice(last, m.index) });
    if (m[1] !== undefined) out.push({ t: "code", text: m[1] });
    else if (m[2] !== undefined) out.push({ t: "bold", children: emphasis(m[2]) });
    else out.push({ t: "italic", children: emphasis(m[3] ?? m[4]) });
    last = m.index! + m[0].length;
  }
  if (last < text.length) out.push({ t: "text", text: text.slice(last) });
  return out;
}

/** One line of a comment as tokens. */
export function parseLine(line: string, members: Member[] = []): Inline[] {
  const marks: Array<{ start: number; end: number; token: Inline }> = [];
  for (const m of line.matchAll(URL_RE)) {
    const url = trimUrl(m[0]);
    const href = /^https?:/i.test(url) ? safeHref(url) : bareHref(url);
    if (href) marks.push({ start: m.index!, end: m.index! + url.length, token: { t: "link", href, text: url } });
  }
  for (const f of findMentions(line, members)) {
    if (!marks.some((k) => f.start < k.end && k.start < f.end)) marks.push({ start: f.start, end: f.end, token: { t: "mention", userId: f.userId, text: line.slice(f.start, f.end) } });
  }
  marks.sort((a, b) => a.start - b.start);
  const out: Inline[] = [];
  let last = 0;
  for (const k of marks) {
    if (k.start > last) out.push(...emphasis(line.slice(last, k.start)));
    out.push(k.token);
    last = k.end;
  }
  if (last < line.length) out.push(...emphasis(line.slice(last)));
  return out;
}

/** A whole comment: one array of tokens per line. */
export function parseComment(text: string, members: Member[] = []): Inline[][] {
  return text.replace(/\r\n?/g, "\n").split("\n").map((line) => parseLine(line, members));
}

/** The words of a comment without its formatting marks (for one-line quotes: the activity, mails). */
export function plainText(text: string): string {
  const flat = (xs: Inline[]): string => xs.map((x) => ("children" in x ? flat(x.children) : x.text)).join("");
  return parseComment(text).map(flat).join(" ").replace(/\s+/g, " ").trim();
}
