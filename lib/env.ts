// Settings read from the environment, in one place. Plain functions (no `server-only`) so the
// lifecycle scripts and the local SMTP fake read the same values as the app.

const DEV_SECRET = "counterpoise-development-secret-not-for-production";

/** The app's public URL without a trailing slash (cookies, links in e-mails, origin checks). */
export function appUrl(): string {
  const raw = process.env.APP_URL || `http://127.0.0.1:${process.env.PORT || 3000}`;
  return raw.replace(/\/+$/, "");
}

/** The app's origin (scheme, host and port) that browsers send in the Origin header. */
export function appOrigin(): string {
  return new URL(appUrl()).origin;
}

/** Cookies get the Secure attribute only when the app is served over https. */
export function isHttpsApp(): boolean {
  return appUrl().startsWith("https://");
}

export class MissingSecretError extends Error {
  constructor() {
    super(
      "BETTER_AUTH_SECRET is not set. The app signs session cookies with it and refuses to run in production without one. " +
        "Set it in the environment or in .env.local (generate one with `openssl rand -base64 32`); `npm start` writes one for you.",
    );
    this.name = "MissingSecretError";
  }
}

/** The secret that signs cookies and tokens. Production refuses to run without a real one. */
export function authSecret(): string {
  const secret = process.env.BETTER_AUTH_SECRET;
  if (secret) return secret;
  if (process.env.NODE_ENV === "production") throw new MissingSecretError();
  return DEV_SECRET;
}

function positiveNumber(name: string, fallback: number): number {
  const value = Number(process.env[name]);
  return Number.isFinite(value) && value > 0 ? value : fallback;
}

/** Sign-in (and sign-up, password change) attempts allowed per window before 429. */
export function authRateLimit(): { max: number; window: number } {
  return { max: positiveNumber("AUTH_RATE_LIMIT_MAX", 5), window: positiveNumber("AUTH_RATE_LIMIT_WINDOW", 10) };
}

/**
 * Minutes between the server's own sweeps of unsaved underlays (UPLOAD_SWEEP_MINUTES, default 60;
 * 0 turns them off). Not a number: an error naming the variable, which the caller logs.
 */
export function uploadSweepMinutes(): number {
  const raw = process.env.UPLOAD_SWEEP_MINUTES;
  if (raw === undefined || raw.trim() === "") return 60;
  const value = Number(raw);
  if (!Number.isFinite(value) || value < 0) throw new Error(`UPLOAD_SWEEP_MINUTES must be a number of minutes (0 turns the sweep off), not "${raw}"`);
  return value;
}

/** How long an invitation link stays valid. */
export function invitationTtlHours(): number {
  return positiveNumber("INVITE_TTL_HOURS", 7 * 24);
}

export type SmtpSettings =
  | { kind: "real"; host: string; port: number; secure: boolean; user?: string; password?: string }
  | { kind: "local"; host: "127.0.0.1"; port: number };

/** Real SMTP when SMTP_HOST is set; otherwise the local fake that `npm start` and `npm test` run. */
export function smtpSettings(): SmtpSettings {
  const port = positiveNumber("SMTP_PORT", 2525);
  const host = process.env.SMTP_HOST;
  if (!host) return { kind: "local", host: "127.0.0.1", port };
  return {
    kind: "real",
    host,
    port,
    secure: process.env.SMTP_SECURE === "true" || port === 465,
    user: process.env.SMTP_USER || undefined,
    password: process.env.SMTP_PASSWORD || undefined,
  };
}

export function mailFrom(): string {
  return process.env.MAIL_FROM || "Counterpoise <no-reply@counterpoise.local>";
}

/** A host name or address that only this machine reaches (an optional :port is ignored). */
export function isLoopbackHost(host: string): boolean {
  let name = host.trim().toLowerCase();
  const bracketed = /^\[([^\]]*)\]/.exec(name); // [::1] or [::1]:3000
  if (bracketed) name = bracketed[1];
  else if (name.split(":").length === 2) name = name.split(":")[0]; // name:port (a bare IPv6 address has more colons)
  return name === "localhost" || name.endsWith(".localhost") || name === "::1" || /^127(\.\d{1,3}){3}$/.test(name);
}

function isLoopbackUrl(url: string): boolean {
  try {
    return isLoopbackHost(new URL(url).hostname);
  } catch {
    return false;
  }
}

/**
 * The local mailbox page lists every mail the fake received, reset links included, so it is
 * only served when no real SMTP is configured, the app runs on loopback (APP_URL, the address it
 * listens on, and, when given, the Host the request came to), or DEV_MAILBOX=1 says otherwise.
 * APP_URL alone is not enough: `HOST=0.0.0.0 npm start` keeps a loopback APP_URL while the whole
 * network can reach the app.
 */
export function mailboxEnabled(requestHost?: string | null): boolean {
  if (process.env.SMTP_HOST) return false;
  if (process.env.DEV_MAILBOX === "1") return true;
  const bindHost = process.env.HOST;
  if (bindHost && !isLoopbackHost(bindHost)) return false;
  if (requestHost !== undefined && !(requestHost && isLoopbackHost(requestHost))) return false;
  return isLoopbackUrl(appUrl());
}

/**
 * The reverse proxies whose X-Forwarded-For entries are believed (TRUSTED_PROXIES: addresses or
 * CIDR ranges, comma-separated). Empty by default: then only the last hop counts.
 */
export function trustedProxies(): string[] {
  return (process.env.TRUSTED_PROXIES ?? "")
    .split(",")
    .map((s) => s.trim())
    .filter(Boolean);
}

export type StorageSettings = {
  kind: "real" | "local";
  endpoint: string;
  region: string;
  bucket: string;
  accessKeyId: string;
  secretAccessKey: string;
  /** path-style URLs (the local fake and most S3-compatible servers need them) */
  forcePathStyle: boolean;
  port: number;
};

/** A real bucket when S3_ENDPOINT is set; otherwise the local fake that `npm start` and `npm test` run. */
export function storageSettings(): StorageSettings {
  const port = positiveNumber("S3_PORT", 4569);
  if (process.env.S3_ENDPOINT) {
    return {
      kind: "real",
      endpoint: process.env.S3_ENDPOINT,
      region: process.env.S3_REGION || "us-east-1",
      bucket: process.env.S3_BUCKET || "counterpoise-uploads",
      accessKeyId: process.env.S3_ACCESS_KEY_ID || "",
      secretAccessKey: process.env.S3_SECRET_ACCESS_KEY || "",
      forcePathStyle: process.env.S3_FORCE_PATH_STYLE === "true",
      port,
    };
  }
  return {
    kind: "local",
    endpoint: `http://127.0.0.1:${port}`,
    region: "us-east-1",
    bucket: process.env.S3_BUCKET || "counterpoise-uploads",
    // the local fake's fixed credentials
    accessKeyId: "S3RVER",
    secretAccessKey: "S3RVER",
    forcePathStyle: true,
    port,
  };
}
