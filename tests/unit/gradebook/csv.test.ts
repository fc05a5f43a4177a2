import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { csvFileName, escapeCell, toCsv } from "@/lib/gradebook/csv";

describe("escapeCell", () => {
  it.each(["=SUM(A1:A9)", "+1", "-2+3", "@cmd", "\t=1", "\r=1"])("puts a quote before %j so a spreadsheet does not run it", (value) => {
    expect(escapeCell(value)).toBe(`'${value}`);
  });

  it("leaves ordinary text and numbers alone", () => {
    expect(escapeCell("Ana O'Neil")).toBe("Ana O'Neil");
    expect(escapeCell("a=b")).toBe("a=b");
    expect(escapeCell(12.5)).toBe("12.5");
    expect(escapeCell(null)).toBe("");
  });
});

describe("toCsv", () => {
  it("round-trips through papaparse with commas, quotes, line breaks and accents kept", () => {
    const header = ["Student", "E-mail", "Stairs, rise & run (10 pts)", "Total"];
    const rows = [
      ["Zoë Łukasz", "zoe@shop.example", 7.5, 7.5],
      ['Bo "Plumb" Line', "bo@shop.example", "EXCUSED", 0],
      ["=HYPERLINK(\"http://x\")", "-@evil.example", "line\nbreak", 3],
    ];
    const text = toCsv(header, rows);
    expect(text.startsWith("\uFEFF")).toBe(true);
    const parsed = Papa.parse<string[]>(text.slice(1), { skipEmptyLines: true });
    expect(parsed.errors).toEqual([]);
    expect(parsed.data[0]).toEqual(header);
    expect(parsed.data[1]).toEqual(["Zoë Łukasz", "zoe@shop.example", "7.5", "7.5"]);
    expect(parsed.data[2]).toEqual(['Bo "Plumb" Line', "bo@shop.example", "EXCUSED", "0"]);
    expect(parsed.data[3]).toEqual(["'=HYPERLINK(\"http://x\")", "'-@evil.example", "line\nbreak", "3"]);
    // No cell that a spreadsheet would evaluate survives.
    for (const row of parsed.data) for (const cell of row) expect(cell).not.toMatch(/^[=+\-@\t\r]/);
  });

  it("escapes a header cell too", () => {
    const parsed = Papa.parse<string[]>(toCsv(["=1+1"], [], { bom: false }), { skipEmptyLines: true });
    expect(parsed.data[0]).toEqual(["'=1+1"]);
  });
});

describe("csvFileName", () => {
  it("keeps letters, digits and dashes", () => {
    expect(csvFileName("CARP 120 — Stair Layout", "gradebook")).toBe("carp-120-stair-layout-gradebook.csv");
    expect(csvFileName("***", "record")).toBe("class-record.csv");
  });
});
