import { NextResponse } from "next/server";
import { databaseReachable } from "@/lib/health";

export const dynamic = "force-dynamic";

/** Database reachability: 200 when a query answers, 503 otherwise. */
export async function GET(): Promise<NextResponse> {
  return (await databaseReachable())
    ? NextResponse.json({ status: "ok", database: "reachable" })
    : NextResponse.json({ status: "degraded", database: "unreachable" }, { status: 503 });
}
