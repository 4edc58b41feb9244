/**
 * Sending mail: messages go to the outbox table first, then to SMTP (the fake in development).
 * If the SMTP server is down the message stays queued and a later flush sends it; nothing is dropped.
 */
import nodemailer, { type Transporter } from "nodemailer";
import { deliverNext, enqueue, type OutgoingMessage } from "@/db/outbox";

let transport: Transporter | undefined;

/** The SMTP transport built from SMTP_HOST / SMTP_PORT. */
export function smtpTransport(): Transporter {
  transport ??= nodemailer.createTransport({
    host: process.env.SMTP_HOST ?? "127.0.0.1",
    port: Number(process.env.SMTP_PORT ?? 2525),
    secure: false,
    ignoreTLS: true,
    // Keep connections open between messages: a notice to every safety officer is one connection, not many.
    pool: true,
    maxConnections: 2,
    connectionTimeout: 3000,
    greetingTimeout: 3000,
  });
  return transport;
}

/** Forget the cached transport so the next send reads SMTP_HOST / SMTP_PORT again (tests point it at a closed port). */
export function resetSmtpTransportForTests(): void {
  transport?.close();
  transport = undefined;
}

const FROM = () => process.env.MAIL_FROM ?? "Deepshift <deepshift@kestrin-deep.example>";

// nodemailer's codes for "the server is not there": no point trying the rest of the queue now.
const SERVER_DOWN = new Set(["ECONNECTION", "ETIMEDOUT", "ESOCKET", "EDNS"]);

/**
 * Send what waits in the outbox, oldest first, up to `limit` messages; returns how many went and how many failed.
 * Each message is locked while it is sent, so the app and the job runner never send the same one twice.
 */
export async function flushOutbox(limit = 200): Promise<{ sent: number; failed: number }> {
  let sent = 0;
  let failed = 0;
  let after = 0;
  while (sent + failed < limit) {
    const result = await deliverNext(after, (m) =>
      smtpTransport().sendMail({ from: FROM(), to: m.toAddress, subject: m.subject, text: m.textBody }).then(() => undefined),
    );
    if (!result) break;
    after = result.id;
    if (result.error === undefined) {
      sent++;
      continue;
    }
    failed++;
    const code = (result.error as { code?: string }).code;
    if (code && SERVER_DOWN.has(code)) break;
  }
  return { sent, failed };
}

/** Queue a message and try to send the queue at once. */
export async function sendMail(message: OutgoingMessage): Promise<void> {
  await enqueue(message);
  await flushOutbox();
}

/** The public base URL for links in mail. */
export function appUrl(path: string): string {
  return new URL(path, process.env.NEXTAUTH_URL ?? "http://127.0.0.1:3000").toString();
}
