/**
 * Local SMTP fake: accepts every message on loopback, keeps each as an .eml file, and lists them over HTTP
 * (GET /messages → JSON, newest first; GET / → a plain page) so that the demo and the tests can read mail.
 * Env: SMTP_FAKE_PORT, SMTP_FAKE_HTTP_PORT, SMTP_FAKE_DIR.
 */
import { mkdirSync, readdirSync, readFileSync, writeFileSync } from "node:fs";
import { createServer } from "node:http";
import { join } from "node:path";
import { SMTPServer } from "smtp-server";
import { simpleParser } from "mailparser";

const smtpPort = Number(process.env.SMTP_FAKE_PORT ?? 2525);
const httpPort = Number(process.env.SMTP_FAKE_HTTP_PORT ?? 2580);
const dir = process.env.SMTP_FAKE_DIR ?? ".data/mail";
mkdirSync(dir, { recursive: true });
let sequence = 0;

const smtp = new SMTPServer({
  authOptional: true,
  disabledCommands: ["STARTTLS"],
  onData(stream, _session, callback) {
    const chunks: Buffer[] = [];
    stream.on("data", (c: Buffer) => chunks.push(c));
    stream.on("end", () => {
      const name = `${Date.now().toString().padStart(15, "0")}-${(sequence++).toString().padStart(4, "0")}.eml`;
      writeFileSync(join(dir, name), Buffer.concat(chunks));
      callback();
    });
  },
});

async function listMessages() {
  const files = readdirSync(dir).filter((f) => f.endsWith(".eml")).sort().reverse();
  return Promise.all(
    files.map(async (file) => {
      const parsed = await simpleParser(readFileSync(join(dir, file)));
      const to = Array.isArray(parsed.to) ? parsed.to.map((a) => a.text).join(", ") : (parsed.to?.text ?? "");
      return { file, to, from: parsed.from?.text ?? "", subject: parsed.subject ?? "", date: parsed.date?.toISOString() ?? null, text: parsed.text ?? "" };
    }),
  );
}

function escapeHtml(s: string): string {
  return s.replace(/[&<>"]/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;" })[c] ?? c);
}

const http = createServer((req, res) => {
  listMessages().then(
    (messages) => {
      if (req.url?.startsWith("/messages")) {
        res.writeHead(200, { "content-type": "application/json" });
        res.end(JSON.stringify(messages));
        return;
      }
      const items = messages
        .map((m) => `<article><h2>${escapeHtml(m.subject)}</h2><p>to ${escapeHtml(m.to)} · ${m.date ?? ""}</p><pre>${escapeHtml(m.text)}</pre></article>`)
        .join("");
      res.writeHead(200, { "content-type": "text/html; charset=utf-8" });
      res.end(`<!doctype html><title>Deepshift mail fake</title><h1>Mail received (${messages.length})</h1>${items || "<p>No mail yet.</p>"}`);
    },
    (err: unknown) => {
      res.writeHead(500);
      res.end(String(err));
    },
  );
});

smtp.listen(smtpPort, "127.0.0.1", () => process.stdout.write(`smtp fake listening on 127.0.0.1:${smtpPort}\n`));
http.listen(httpPort, "127.0.0.1", () => process.stdout.write(`mail viewer on http://127.0.0.1:${httpPort}/\n`));

const stop = () => {
  http.close();
  smtp.close(() => process.exit(0));
};
process.on("SIGINT", stop);
process.on("SIGTERM", stop);
