import { NextResponse } from "next/server";
import { checkDatabase } from "@/lib/health";
import { AppError, errorBody } from "@/lib/errors";

export const dynamic = "force-dynamic";

export async function GET() {
  try {
    await checkDatabase();
    return NextResponse.json({ ok: true });
  } catch (error) {
    console.error("health check failed", error);
    return NextResponse.json(errorBody(new AppError("unavailable", "The database is not answering.")), { status: 503 });
  }
}
