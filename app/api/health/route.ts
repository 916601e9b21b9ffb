import { NextResponse } from "next/server";
import { sql } from "@/db";

export const dynamic = "force-dynamic";

/** Readiness: the process answers and the database does too. */
export async function GET() {
  const started = Date.now();
  try {
    await sql`select 1`;
    return NextResponse.json({ status: "ok", database: "ok", ms: Date.now() - started });
  } catch {
    return NextResponse.json({ status: "degraded", database: "unreachable" }, { status: 503 });
  }
}
