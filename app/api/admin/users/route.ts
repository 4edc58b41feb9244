import { NextResponse } from "next/server";
import { listUsers } from "@/db/users";
import { guardApi } from "@/lib/auth/guards";

export const dynamic = "force-dynamic";

/** GET /api/admin/users: every user with roles (admins only). */
export async function GET(req: Request) {
  const who = await guardApi(req, "admin.users");
  if (who instanceof NextResponse) return who;
  return NextResponse.json({ users: await listUsers() });
}
