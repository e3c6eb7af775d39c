// A small MIME reader for the local SMTP fake: enough for the mail this app sends (nodemailer's
// multipart/alternative with quoted-printable or base64 parts, RFC 2047 encoded headers).

export type ParsedMail = { headers: Map<string, string>; subject: string; from: string; text: string; html: string | null };

function decodeBytes(bytes: Buffer, charset = "utf-8"): string {
  try {
    return new TextDecoder(charset.toLowerCase()).decode(bytes);
  } catch {
    return bytes.toString("latin1");
  }
}

function decodeQuotedPrintable(body: string): Buffer {
  const soft = body.replace(/=\r?\n/g, "");
  const bytes: number[] = [];
  for (let i = 0; i < soft.length; i++) {
    const c = soft[i];
    if (c === "=" && /^[0-9A-Fa-f]{2}$/.test(soft.slice(i + 1, i + 3))) {
      bytes.push(parseInt(soft.slice(i + 1, i + 3), 16));
      i += 2;
    } else {
      for (const b of Buffer.from(c, "latin1")) bytes.push(b);
    }
  }
  return Buffer.from(bytes);
}

/** `=?UTF-8?Q?...?=` and `=?UTF-8?B?...?=` words in a header value. */
export function decodeEncodedWords(value: string): string {
  return value
    .replace(/\?=\s+=\?/g, "?==?")
    .replace(/=\?([^?]+)\?([BbQq])\?([^?]*)\?=/g, (_m, charset: string, enc: string, data: string) => {
      const bytes =
        enc.toUpperCase() === "B" ? Buffer.from(data, "base64") : decodeQuotedPrintable(data.replace(/_/g, " "));
      return decodeBytes(bytes, charset);
    });
}

function splitHeadAndBody(raw: string): [string, string] {
  const m = raw.match(/\r?\n\r?\n/);
  if (!m || m.index === undefined) return [raw, ""];
  return [raw.slice(0, m.index), raw.slice(m.index + m[0].length)];
}

function parseHeaders(head: string): Map<string, string> {
  const headers = new Map<string, string>();
  const unfolded = head.replace(/\r?\n[ \t]+/g, " ");
  for (const line of unfolded.split(/\r?\n/)) {
    const i = line.indexOf(":");
    if (i <= 0) continue;
    const name = line.slice(0, i).trim().toLowerCase();
    if (!headers.has(name)) headers.set(name, line.slice(i + 1).trim());
  }
  return headers;
}

function param(header: string | undefined, name: string): string | undefined {
  if (!header) return undefined;
  const m = header.match(new RegExp(`;\\s*${name}\\s*=\\s*(?:"([^"]*)"|([^;\\s]+))`, "i"));
  return m ? (m[1] ?? m[2]) : undefined;
}

type Part = { type: string; text: string };

function readParts(raw: string, depth = 0): Part[] {
  const [head, body] = splitHeadAndBody(raw);
  const headers = parseHeaders(head);
  const contentType = headers.get("content-type") ?? "text/plain; charset=utf-8";
  const type = contentType.split(";")[0].trim().toLowerCase();
  if (type.startsWith("multipart/") && depth < 5) {
    const boundary = param(contentType, "boundary");
    if (!boundary) return [];
    const sections = body.split(new RegExp(`\\r?\\n?--${boundary.replace(/[.*+?^${}()|[\]\\]/g, "\\$&")}(?:--)?[ \\t]*\\r?\\n?`));
    return sections.slice(1).flatMap((s) => (s.trim() ? readParts(s, depth + 1) : []));
  }
  const encoding = (headers.get("content-transfer-encoding") ?? "7bit").toLowerCase();
  const charset = param(contentType, "charset") ?? "utf-8";
  const bytes =
    encoding === "base64"
      ? Buffer.from(body.replace(/\s+/g, ""), "base64")
      : encoding === "quoted-printable"
        ? decodeQuotedPrintable(body)
        : Buffer.from(body, "latin1");
  return [{ type, text: decodeBytes(bytes, charset) }];
}

/** Read a raw RFC 5322 message (as received over SMTP, bytes as latin1) into its subject and text/html bodies. */
export function parseMail(raw: Buffer | string): ParsedMail {
  const source = typeof raw === "string" ? raw : raw.toString("latin1");
  const [head] = splitHeadAndBody(source);
  const headers = parseHeaders(head);
  const parts = readParts(source);
  const text = parts.find((p) => p.type === "text/plain")?.text ?? "";
  const html = parts.find((p) => p.type === "text/html")?.text ?? null;
  return {
    headers,
    subject: decodeEncodedWords(headers.get("subject") ?? "(no subject)"),
    from: decodeEncodedWords(headers.get("from") ?? ""),
    text: text.replace(/\r\n/g, "\n").trimEnd(),
    html,
  };
}

/** The http(s) links in a mail's text, in order, without duplicates. */
export function linksIn(text: string): string[] {
  return [...new Set(text.match(/https?:\/\/[^\s<>"')\]]+/g) ?? [])];
}
