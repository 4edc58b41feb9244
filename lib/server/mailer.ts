/**
 * Sending mail: messages go to the outbox table first, then to SMTP (the fake in development).
 * If the SMTP server is down the message stays queued and a later flush sends it; nothing is dropped.
 */
import nodemailer, { type Transporter } from "nodemailer";
import { enqueue, markFailed, markSent, unsent, type OutgoingMessage } from "@/db/outbox";

let transport: Transporter | undefined;

/** The SMTP transport built from SMTP_HOST / SMTP_PORT. */
export function smtpTransport(): Transporter {
  transport ??= nodemailer.createTransport({
    host: process.env.SMTP_HOST ?? "127.0.0.1",
    port: Number(process.env.SMTP_PORT ?? 2525),
    secure: false,
    ignoreTLS: true,
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

/** Send everything in the outbox that can be sent now; returns how many went and how many failed. */
export async function flushOutbox(): Promise<{ sent: number; failed: number }> {
  let sent = 0;
  let failed = 0;
  for (const m of await unsent()) {
    try {
      await smtpTransport().sendMail({ from: FROM(), to: m.toAddress, subject: m.subject, text: m.textBody });
      await markSent(m.id);
      sent++;
    } catch (err) {
      await markFailed(m.id, err instanceof Error ? err.message : String(err));
      failed++;
    }
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
