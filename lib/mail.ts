// Outgoing e-mail through nodemailer: SMTP_HOST/SMTP_PORT (maildev on loopback in development).
import "server-only";
import nodemailer from "nodemailer";
import { env } from "@/lib/env";

const transport = nodemailer.createTransport({
  host: env.SMTP_HOST,
  port: env.SMTP_PORT,
  secure: false,
  // The local catcher speaks plain SMTP; a real relay would be configured with TLS here.
  ignoreTLS: env.SMTP_HOST === "127.0.0.1" || env.SMTP_HOST === "localhost",
});

export type Mail = {
  to: string;
  subject: string;
  text: string;
  html: string;
  replyTo?: string;
  fromName?: string;
  attachments?: { filename: string; content: Buffer; contentType: string }[];
};

export async function sendMail(mail: Mail): Promise<void> {
  const from = mail.fromName ? `${mail.fromName} via Ribbonry <${fromAddress()}>` : env.MAIL_FROM;
  await transport.sendMail({ ...mail, from });
}

function fromAddress(): string {
  const m = /<([^>]+)>/.exec(env.MAIL_FROM);
  return m?.[1] ?? env.MAIL_FROM;
}

const escapeHtml = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);

/** A plain message with one call-to-action link, as both HTML and text. */
export function linkMail(opts: { heading: string; lines: string[]; linkText: string; url: string }) {
  const text = [opts.heading, "", ...opts.lines, "", `${opts.linkText}: ${opts.url}`, "", "— Ribbonry"].join("\n");
  const html = `<!doctype html><html><body style="font-family:system-ui,sans-serif;color:#1f1a2e;line-height:1.5">
<h1 style="font-size:20px;color:#5b2a86">${escapeHtml(opts.heading)}</h1>
${opts.lines.map((l) => `<p>${escapeHtml(l)}</p>`).join("\n")}
<p><a href="${escapeHtml(opts.url)}" style="display:inline-block;background:#5b2a86;color:#fff;padding:10px 16px;border-radius:6px;text-decoration:none">${escapeHtml(opts.linkText)}</a></p>
<p style="font-size:12px;color:#6b6478">If the button does not work, paste this address into your browser: ${escapeHtml(opts.url)}</p>
</body></html>`;
  return { text, html };
}
