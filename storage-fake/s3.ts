/**
 * Local S3-compatible object store for development and tests (s3rver), on loopback only.
 * Usage: tsx storage-fake/s3.ts  (env: S3_FAKE_PORT, S3_FAKE_DIR, S3_BUCKET)
 */
import { mkdirSync } from "node:fs";
import S3rver from "s3rver";

const port = Number(process.env.S3_FAKE_PORT ?? 4569);
const directory = process.env.S3_FAKE_DIR ?? ".data/s3";
const bucket = process.env.S3_BUCKET ?? "deepshift-attachments";
mkdirSync(directory, { recursive: true });

const server = new S3rver({
  port,
  address: "127.0.0.1",
  directory,
  silent: true,
  configureBuckets: [{ name: bucket, configs: [] }],
});

server.run().then(
  () => process.stdout.write(`s3 fake listening on http://127.0.0.1:${port} (bucket ${bucket}, files in ${directory})\n`),
  (err: unknown) => {
    process.stderr.write(`s3 fake failed to start: ${String(err)}\n`);
    process.exit(1);
  },
);

const stop = () => server.close().finally(() => process.exit(0));
process.on("SIGINT", stop);
process.on("SIGTERM", stop);
