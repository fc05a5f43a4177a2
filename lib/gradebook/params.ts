import { z } from "zod";
import { idParam } from "@/lib/classes/schemas";

export const classParams = z.object({ classId: idParam("class id") });
export const cellParams = z.object({ classId: idParam("class id"), assignmentId: idParam("assignment id"), studentId: idParam("student id") });
export const studentParams = z.object({ classId: idParam("class id"), studentId: idParam("student id") });

/** A CSV download: UTF-8 with a BOM (in the text), named for the class. */
export function csvResponse(file: { fileName: string; text: string }): Response {
  return new Response(file.text, {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": `attachment; filename="${file.fileName}"`,
      "cache-control": "no-store",
    },
  });
}
