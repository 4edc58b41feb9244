/** Reads what the SMTP fake received (its HTTP listing), for tests that follow an e-mail. */
export const MAIL_FAKE_URL = process.env.MAIL_FAKE_URL ?? "http://127.0.0.1:2590";

export type FakeMail = { file: string; to: string; from: string; subject: string; date: string | null; text: string };

/** Every message received so far, newest first. */
export async function allMail(): Promise<FakeMail[]> {
  const res = await fetch(`${MAIL_FAKE_URL}/messages`);
  return (await res.json()) as FakeMail[];
}

/** Wait (up to timeoutMs) for a message to an address whose subject matches. */
export async function waitForMail(to: string, subject: RegExp = /.*/, timeoutMs = 10_000): Promise<FakeMail> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const found = (await allMail()).find((m) => m.to.includes(to) && subject.test(m.subject));
    if (found) return found;
    if (Date.now() > deadline) throw new Error(`no mail to ${to} matching ${subject} within ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 200));
  }
}
