import { NextResponse } from "next/server";
import { handle } from "@/lib/auth/route";
import { ownerFromRequest } from "@/lib/practice/owner";
import { getProblem } from "@/lib/practice/problems";

export const GET = handle<{ id: string }>(async (req, { params }) => NextResponse.json({ problem: await getProblem(await ownerFromRequest(req), params.id) }));
