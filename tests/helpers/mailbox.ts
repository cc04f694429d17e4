// Reads mail caught by the local maildev through its REST API (see scripts/services.ts for the endpoints).
import { simpleParser, type AddressObject } from "mailparser";

export type MailSummary = { id: string; subject: string; to: string[]; from: string[]; time: string };
export type MailAttachment = { filename: string; contentType: string; size: number; content: Buffer };
export type ParsedMail = { id: string; subject: string; to: string[]; text: string; html: string; links: string[]; attachments: MailAttachment[] };

type MaildevEmail = { id: string; subject?: string; to?: { address: string }[]; from?: { address: string }[]; time: string };

const base = (mailWebUrl: string) => mailWebUrl.replace(/\/+$/, "");

async function ok(res: Response, what: string): Promise<Response> {
  if (!res.ok) throw new Error(`maildev ${what} failed: HTTP ${res.status} ${await res.text()}`);
  return res;
}

/** Every caught message, newest first. */
export async function listMail(mailWebUrl: string): Promise<MailSummary[]> {
  const res = await ok(await fetch(`${base(mailWebUrl)}/api/email?sort=desc`), "list");
  const emails = (await res.json()) as MaildevEmail[];
  return emails.map((e) => ({
    id: e.id,
    subject: e.subject ?? "",
    to: (e.to ?? []).map((a) => a.address.toLowerCase()),
    from: (e.from ?? []).map((a) => a.address.toLowerCase()),
    time: e.time,
  }));
}

/** Polls until a message to `to` whose subject contains `subjectIncludes` arrives; returns the newest match. */
export async function waitForMail(
  mailWebUrl: string,
  opts: { to: string; subjectIncludes?: string; timeoutMs?: number },
): Promise<ParsedMail> {
  const deadline = Date.now() + (opts.timeoutMs ?? 5_000);
  const to = opts.to.toLowerCase();
  let seen: MailSummary[] = [];
  for (;;) {
    seen = await listMail(mailWebUrl);
    const hit = seen.find((m) => m.to.includes(to) && (!opts.subjectIncludes || m.subject.includes(opts.subjectIncludes)));
    if (hit) return readMail(mailWebUrl, hit.id);
    if (Date.now() > deadline) break;
    await new Promise((r) => setTimeout(r, 100));
  }
  const lines = seen.slice(0, 10).map((m) => `  ${m.to.join(",")}: ${m.subject}`);
  throw new Error(
    `no mail to ${opts.to}${opts.subjectIncludes ? ` with subject containing "${opts.subjectIncludes}"` : ""} within ${opts.timeoutMs ?? 5_000} ms; ` +
      `caught ${seen.length}:\n${lines.join("\n")}`,
  );
}

/** Parses the raw .eml (what a real mail client would see), not maildev's own rendering. */
export async function readMail(mailWebUrl: string, id: string): Promise<ParsedMail> {
  const res = await ok(await fetch(`${base(mailWebUrl)}/api/email/${encodeURIComponent(id)}/source`), "source");
  const parsed = await simpleParser(Buffer.from(await res.arrayBuffer()));
  const html = typeof parsed.html === "string" ? parsed.html : "";
  const text = parsed.text ?? "";
  const attachments = parsed.attachments.map((a) => ({ filename: a.filename ?? "", contentType: a.contentType, size: a.size, content: a.content }));
  return { id, subject: parsed.subject ?? "", to: addresses(parsed.to), text, html, links: extractLinks(html, text), attachments };
}

export async function clearMail(mailWebUrl: string): Promise<void> {
  await ok(await fetch(`${base(mailWebUrl)}/api/email/all`, { method: "DELETE" }), "delete all");
}

function addresses(to: AddressObject | AddressObject[] | undefined): string[] {
  const list = Array.isArray(to) ? to : to ? [to] : [];
  return list.flatMap((o) => o.value.map((a) => (a.address ?? "").toLowerCase())).filter(Boolean);
}

const decodeEntities = (s: string) =>
  s.replace(/&amp;/g, "&").replace(/&quot;/g, '"').replace(/&#39;/g, "'").replace(/&lt;/g, "<").replace(/&gt;/g, ">");

/** href targets from the HTML first, then bare URLs in the text part; absolute http(s) only, deduplicated. */
function extractLinks(html: string, text: string): string[] {
  const fromHtml = [...html.matchAll(/href\s*=\s*(?:"([^"]*)"|'([^']*)')/gi)].map((m) => decodeEntities(m[1] ?? m[2] ?? ""));
  const fromText = [...text.matchAll(/https?:\/\/[^\s<>"')\]]+/g)].map((m) => m[0]);
  return [...new Set([...fromHtml, ...fromText])].filter((l) => /^https?:\/\//i.test(l));
}
