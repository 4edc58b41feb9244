/**
 * Scheduled work, run every minute by docker-free-scripts/jobs.ts (and callable from tests and POST /api/jobs):
 * the safety notices (digest, overdue checkouts, leak tests due) queue their mail, then the outbox job sends
 * everything waiting. Each job is safe to run repeatedly: notices carry dedupe keys.
 */
import { flushOutbox } from "./mailer";
import { SAFETY_JOBS } from "./safety-jobs";

export type Job = { name: string; run: (now: Date) => Promise<string> };

export const JOBS: Job[] = [
  ...SAFETY_JOBS,
  // Last, so that what the jobs above queued goes out in the same run.
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
