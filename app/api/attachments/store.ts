/** The attachment bytes in S3: stored with PutObject, served through short-lived presigned GET URLs. */
import { GetObjectCommand, PutObjectCommand } from "@aws-sdk/client-s3";
import { getSignedUrl } from "@aws-sdk/s3-request-presigner";
import { bucket, s3 } from "@/lib/server/storage";
import { contentDisposition } from "@/lib/logbook/file-name";
import { isImageMime } from "@/lib/logbook/file-type";

/** How long a download link stays valid, in seconds. */
export const PRESIGN_SECONDS = 60;

/** Store the bytes under the server-made key with the type the server determined. */
export async function putObject(key: string, bytes: Uint8Array, contentType: string): Promise<void> {
  await s3().send(new PutObjectCommand({ Bucket: bucket(), Key: key, Body: bytes, ContentType: contentType, ContentLength: bytes.byteLength }));
}

/** A presigned GET URL valid PRESIGN_SECONDS; pictures and PDFs open inline, everything else downloads. */
export async function presignedGet(key: string, contentType: string, fileName: string): Promise<string> {
  const inline = isImageMime(contentType) || contentType.startsWith("application/pdf");
  const command = new GetObjectCommand({
    Bucket: bucket(),
    Key: key,
    ResponseContentType: contentType,
    ResponseContentDisposition: contentDisposition(fileName, inline),
  });
  return getSignedUrl(s3(), command, { expiresIn: PRESIGN_SECONDS });
}

/** Read a request body up to maxBytes; "too_large" as soon as it grows past the limit (the rest is not read). */
export async function readCapped(body: ReadableStream<Uint8Array> | null, maxBytes: number): Promise<Uint8Array | "too_large"> {
  if (!body) return new Uint8Array(0);
  const reader = body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > maxBytes) {
      await reader.cancel().catch(() => undefined);
      return "too_large";
    }
    chunks.push(value);
  }
  const out = new Uint8Array(total);
  let at = 0;
  for (const c of chunks) {
    out.set(c, at);
    at += c.byteLength;
  }
  return out;
}
