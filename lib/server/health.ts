/** Reachability of the three services the app depends on: MariaDB, the object store and SMTP. */
import { HeadBucketCommand } from "@aws-sdk/client-s3";
import { pool } from "@/db/client";
import { bucket, s3 } from "./storage";
import { smtpTransport } from "./mailer";

export type ServiceHealth = { ok: boolean; detail: string; ms: number };

async function timed(check: () => Promise<string>): Promise<ServiceHealth> {
  const t0 = performance.now();
  try {
    const detail = await check();
    return { ok: true, detail, ms: Math.round(performance.now() - t0) };
  } catch (err) {
    return { ok: false, detail: err instanceof Error ? err.message : String(err), ms: Math.round(performance.now() - t0) };
  }
}

/** Check every service; ok only when all are. */
export async function checkHealth(): Promise<{ ok: boolean; services: Record<string, ServiceHealth> }> {
  const [database, objectStore, smtp] = await Promise.all([
    timed(async () => {
      const [rows] = await pool().query("SELECT VERSION() AS v");
      return `MariaDB ${(rows as { v: string }[])[0]?.v ?? "?"}`;
    }),
    timed(async () => {
      await s3().send(new HeadBucketCommand({ Bucket: bucket() }));
      return `bucket ${bucket()} reachable`;
    }),
    timed(async () => {
      await smtpTransport().verify();
      return "SMTP server answers";
    }),
  ]);
  const services = { database, objectStore, smtp };
  return { ok: Object.values(services).every((s) => s.ok), services };
}
