/**
 * Scheduled work, run every minute by docker-free-scripts/jobs.ts (and callable from tests):
 * sending what waits in the outbox, plus the jobs later features register in JOBS.
 */
import { flushOutbox } from "./mailer";

export type Job = { name: string; run: (now: Date) => Promise<string> };

export const JOBS: Job[] = [
  {
    name: "outbox",
    run: async () => {
      const r = await flushOutbox();
      return `${r.sent} sent, ${r.failed} still queued`;
    },
  },
];

/** Run every job once; one job failing does not stop the others. */
export async function runJobs(now = new Date()): Promise<Record<string, string>> {
  const report: Record<string, string> = {};
  for (const job of JOBS) {
    try {
      report[job.name] = await job.run(now);
    } catch (err) {
      report[job.name] = `failed: ${err instanceof Error ? err.message : String(err)}`;
    }
  }
  return report;
}
