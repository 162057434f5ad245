// Outgoing e-mail through SMTP (the local fake in development and tests).
import nodemailer from "nodemailer";
import { env } from "./env.server";

const transport = nodemailer.createTransport({
  host: env.SMTP_HOST,
  port: env.SMTP_PORT,
  secure: false,
  ignoreTLS: env.SMTP_HOST === "127.0.0.1" || env.SMTP_HOST === "localhost",
});

export interface MailMessage {
  to: string;
  subject: string;
  /** Plain paragraphs; each becomes a <p>. */
  paragraphs: string[];
  action?: { label: string; url: string };
}

function escapeHtml(text: string) {
  return text.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);
}

export function renderMail({ paragraphs, action }: Pick<MailMessage, "paragraphs" | "action">) {
  const body = paragraphs.map((p) => `<p style="margin:0 0 12px">${escapeHtml(p)}</p>`).join("");
  const button = action
    ? `<p style="margin:20px 0"><a href="${escapeHtml(action.url)}" style="background:#a4532a;color:#fffaf2;padding:10px 18px;border-radius:6px;text-decoration:none">${escapeHtml(action.label)}</a></p><p style="font-size:12px;color:#6b6257">Or paste this address into your browser: ${escapeHtml(action.url)}</p>`
    : "";
  const html = `<div style="font-family:Arial,sans-serif;color:#1f2430;max-width:560px"><p style="font-weight:bold;letter-spacing:.04em">KITWRIGHT</p>${body}${button}</div>`;
  const text = [...paragraphs, ...(action ? [`${action.label}: ${action.url}`] : [])].join("\n\n");
  return { html, text };
}

export async function sendMail(message: MailMessage) {
  const { html, text } = renderMail(message);
  await transport.sendMail({ from: env.MAIL_FROM, to: message.to, subject: message.subject, html, text });
}
