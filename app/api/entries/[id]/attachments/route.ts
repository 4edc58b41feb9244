import { NextResponse } from "next/server";
import { entryState } from "@/db/entries";
import { listAttachments, markFailed, markStored, restartAttachment, startAttachment } from "@/db/attachments";
import { apiError, guardApi } from "@/lib/auth/guards";
import { checkFileSize, checkFileType, formatBytes, parseMaxBytes } from "@/lib/logbook/attachment-check";
import { LogbookInputError } from "@/lib/logbook/errors";
import { sanitiseFileName } from "@/lib/logbook/file-name";
import { putObject, readCapped } from "@/app/api/attachments/store";
import { idFrom, writerId } from "../../respond";

export const dynamic = "force-dynamic";

type Ctx = { params: Promise<{ id: string }> };

/** GET /api/entries/{id}/attachments: the entry's attachments with their states. */
export async function GET(req: Request, ctx: Ctx) {
  const who = await guardApi(req, "entries.read");
  if (who instanceof NextResponse) return who;
  const id = idFrom((await ctx.params).id);
  if (id instanceof NextResponse) return id;
  if (!(await entryState(id))) return apiError(404, `there is no entry ${id}`);
  return NextResponse.json({ attachments: await listAttachments(id) });
}

function fileNameFrom(req: Request, url: URL): string | null {
  const header = req.headers.get("x-file-name");
  if (header) {
    try {
      return decodeURIComponent(header);
    } catch {
      return header;
    }
  }
  return url.searchParams.get("name");
}

/**
 * POST /api/entries/{id}/attachments, the raw file as the body, its name in the X-File-Name header (URI-encoded) or
 * ?name=; ?retry={attachmentId} reuses a failed record. The type is judged by the first bytes. 201 with the stored
 * attachment; 413 too large, 415 refused type, 502 file store failure, each {error, field, attachmentId}.
 */
export async function POST(req: Request, ctx: Ctx) {
  const who = await guardApi(req, "entries.write");
  if (who instanceof NextResponse) return who;
  const userId = writerId(who);
  if (userId instanceof NextResponse) return userId;
  const entryId = idFrom((await ctx.params).id);
  if (entryId instanceof NextResponse) return entryId;
  const url = new URL(req.url);
  const entry = await entryState(entryId);
  if (!entry) return apiError(404, `there is no entry ${entryId}`);
  if (entry.retractedAt) return apiError(409, `entry ${entryId} has been retracted and takes no new files`, { code: "retracted" });
  const rawName = fileNameFrom(req, url);
  if (!rawName) return apiError(400, "name the file in the X-File-Name header", { field: "x-file-name" });
  const fileName = sanitiseFileName(rawName);
  const maxBytes = parseMaxBytes(process.env.ATTACHMENT_MAX_BYTES);
  const declared = Number(req.headers.get("content-length") ?? "0") || 0;

  const record = { entryId, fileName, contentType: "application/octet-stream", sizeBytes: declared };
  const retryOf = url.searchParams.get("retry");
  const started = retryOf ? await restartAttachment(Number(retryOf) || 0, record) : await startAttachment({ userId }, record);
  if (!started) return apiError(409, "only a failed upload of this entry can be retried", { field: "retry" });
  const fail = async (status: number, reason: string, field = "file") => {
    await markFailed({ userId }, started.id, reason);
    return apiError(status, reason, { field, attachmentId: started.id, fileName });
  };

  try {
    if (declared > 0) checkFileSize(declared, maxBytes, `"${fileName}"`);
    const bytes = await readCapped(req.body, maxBytes);
    if (bytes === "too_large") return await fail(413, `"${fileName}" is larger than the limit of ${formatBytes(maxBytes)} per file`);
    checkFileSize(bytes.byteLength, maxBytes, `"${fileName}"`);
    const checked = checkFileType(fileName, bytes);
    try {
      await putObject(started.objectKey, bytes, checked.contentType);
    } catch (err) {
      const why = err instanceof Error ? err.message : String(err);
      return await fail(502, `the file store did not accept "${fileName}" (${why}); try again`, "storage");
    }
    await markStored({ userId }, started.id, { contentType: checked.contentType, sizeBytes: bytes.byteLength });
    return NextResponse.json(
      { id: started.id, entryId, fileName, contentType: checked.contentType, sizeBytes: bytes.byteLength, state: "stored", url: `/api/attachments/${started.id}` },
      { status: 201 },
    );
  } catch (err) {
    if (err instanceof LogbookInputError) {
      const status = err.code === "file_too_large" ? 413 : err.code === "file_empty" ? 400 : 415;
      return await fail(status, err.message, err.field);
    }
    await markFailed({ userId }, started.id, "the upload broke off before the whole file arrived; try again").catch(() => undefined);
    throw err;
  }
}
