import "server-only";
import nodemailer, { type Transporter } from "nodemailer";

/**
 * Outgoing e-mail through SMTP. `SMTP_URL` (e.g. smtp://127.0.0.1:2525) names the server; in
 * development and tests the start and test scripts run a local SMTP fake there. Without it,
 * messages are written to the server log instead, so nothing depends on a hosted service.
 */
let transporter: Transporter | null | undefined;

function transport(): Transporter | null {
  if (transporter !== undefined) return transporter;
  const url = process.env.SMTP_URL;
  if (!url) {
    transporter = null;
    return null;
  }
  const parsed = new URL(url);
  transporter = nodemailer.createTransport({
    host: parsed.hostname,
    port: Number(parsed.port || 25),
    secure: parsed.protocol === "smtps:",
    ignoreTLS: parsed.protocol !== "smtps:",
    auth: parsed.username ? { user: decodeURIComponent(parsed.username), pass: decodeURIComponent(parsed.password) } : undefined,
  });
  return transporter;
}

export interface Mail {
  to: string;
  subject: string;
  text: string;
}

export const MAIL_FROM = process.env.MAIL_FROM ?? "Seatwise <no-reply@seatwise.invalid>";

export async function sendMail(mail: Mail): Promise<void> {
  const t = transport();
  if (!t) {
    console.info(`[seatwise] e-mail to ${mail.to}: ${mail.subject}\n${mail.text}`);
    return;
  }
  await t.sendMail({ from: MAIL_FROM, ...mail });
}
