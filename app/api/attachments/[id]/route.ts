import { NextResponse } from "next/server";
import { getAttachment } from "@/db/attachments";
import { apiError, guardApi } from "@/lib/auth/guards";
import { idFrom } from "@/app/api/entries/respond";
import { presignedGet } from "../store";

export const dynamic = "force-dynamic";

/** GET /api/attachments/{id}: for a signed-in reader, a redirect to a presigned URL valid about 60 s. */
export async function GET(req: Request, ctx: { params: Promise<{ id: string }> }) {
  const who = await guardApi(req, "entries.read");
  if (who instanceof NextResponse) return who;
  const id = idFrom((await ctx.params).id);
  if (id instanceof NextResponse) return id;
  const file = await getAttachment(id);
  if (!file) return apiError(404, `there is no attachment ${id}`);
  if (file.state !== "stored") {
    const why = file.state === "failed" ? `its upload failed: ${file.failureReason ?? "no reason recorded"}` : "its upload has not finished";
    return apiError(409, `attachment ${id} cannot be downloaded: ${why}`, { state: file.state });
  }
  const target = await presignedGet(file.objectKey, file.contentType, file.fileName);
  // Never cache the redirect: the presigned URL behind it expires within a minute.
  return NextResponse.redirect(target, { status: 302, headers: { "cache-control": "no-store" } });
}
