/** The S3 client for attachments (the local fake in development; any S3-compatible store in production). */
import { S3Client } from "@aws-sdk/client-s3";

let client: S3Client | undefined;

/** The configured S3 client. */
export function s3(): S3Client {
  client ??= new S3Client({
    endpoint: process.env.S3_ENDPOINT ?? "http://127.0.0.1:4569",
    region: process.env.S3_REGION ?? "us-east-1",
    forcePathStyle: true,
    credentials: { accessKeyId: process.env.S3_ACCESS_KEY ?? "S3RVER", secretAccessKey: process.env.S3_SECRET_KEY ?? "S3RVER" },
    // The fake stores chunk-signed stream uploads corrupted unless checksums are only sent when required.
    requestChecksumCalculation: "WHEN_REQUIRED",
    responseChecksumValidation: "WHEN_REQUIRED",
  });
  return client;
}

/** The attachments bucket. */
export function bucket(): string {
  return process.env.S3_BUCKET ?? "deepshift-attachments";
}
