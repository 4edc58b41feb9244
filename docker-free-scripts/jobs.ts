/** The job runner started by docker-free-scripts/start: runs lib/server/jobs every minute until stopped. */
import { closeDb } from "@/db/client";
import { runJobs } from "@/lib/server/jobs";

const EVERY_MS = Number(process.env.DEEPSHIFT_JOBS_EVERY_MS ?? 60_000);
let stopping = false;

async function loop(): Promise<void> {
  while (!stopping) {
    const report = await runJobs();
    process.stdout.write(`${new Date().toISOString()} ${JSON.stringify(report)}\n`);
    await new Promise((r) => setTimeout(r, EVERY_MS));
  }
}

const stop = () => {
  stopping = true;
  closeDb().finally(() => process.exit(0));
};
process.on("SIGINT", stop);
process.on("SIGTERM", stop);
void loop();
