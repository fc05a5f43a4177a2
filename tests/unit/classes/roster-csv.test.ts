import { describe, expect, it } from "vitest";
import { parseRosterCsv } from "@/lib/classes/roster-csv";

describe("parseRosterCsv", () => {
  it.each([
    ["Name,E-mail", "name", "email"],
    ["Full name;Email Address", "fullname", "emailaddress"],
    ["Student\tmail", "student", "mail"],
    ["  E-MAIL , Student Name ", "studentname", "email"],
  ])("finds the columns in %j", (header) => {
    const parsed = parseRosterCsv(`${header}\n${header.includes(";") ? "Avery Castellanos;avery@example.com" : header.includes("\t") ? "Avery Castellanos\tavery@example.com" : header.trim().startsWith("E-MAIL") ? "avery@example.com,Avery Castellanos" : "Avery Castellanos,avery@example.com"}`);
    expect(parsed.fileError).toBeNull();
    expect(parsed.rows).toEqual([{ line: 2, name: "Avery Castellanos", email: "avery@example.com", error: null, note: null }]);
  });

  it("joins first and last name columns when there is no single name column", () => {
    const parsed = parseRosterCsv("Last Name,First Name,Email\nRahimi,Bashir,bashir@example.com");
    expect(parsed.rows[0]).toMatchObject({ name: "Bashir Rahimi", email: "bashir@example.com" });
  });

  it("marks bad, missing and duplicate e-mails with the line they are on, and notes a missing name", () => {
    const parsed = parseRosterCsv(
      ["Name,Email", "Avery,AVERY@example.com", "Bashir,not-an-address", "Caitlin,", ",dana@example.com", "Avery again,avery@example.com", '"Moreau, Caitlin",caitlin@example.com'].join("\r\n"),
    );
    expect(parsed.rows.map((r) => [r.line, r.error === null ? "ok" : r.error])).toEqual([
      [2, "ok"],
      [3, "“not-an-address” is not an e-mail address."],
      [4, "No e-mail address on this row."],
      [5, "ok"],
      [6, "Same e-mail as line 2; one invitation is enough."],
      [7, "ok"],
    ]);
    expect(parsed.rows[0].email).toBe("avery@example.com");
    expect(parsed.rows[3]).toMatchObject({ name: "dana", note: expect.stringMatching(/No name given/) });
    expect(parsed.rows[5].name).toBe("Moreau, Caitlin");
  });

  it("reads a file with no header row when a column holds e-mail addresses", () => {
    const parsed = parseRosterCsv("Avery Castellanos,avery@example.com\nBashir Rahimi,bashir@example.com");
    expect(parsed.rows.map((r) => [r.line, r.name, r.email])).toEqual([
      [1, "Avery Castellanos", "avery@example.com"],
      [2, "Bashir Rahimi", "bashir@example.com"],
    ]);
  });

  it("refuses a file without an e-mail column, an empty file, and one over 500 students", () => {
    expect(parseRosterCsv("Name,Phone\nAvery,555").fileError).toMatch(/No e-mail column/);
    expect(parseRosterCsv("\n\n").fileError).toMatch(/empty/);
    expect(parseRosterCsv("Name,Email\n").fileError).toMatch(/no students/);
    const big = ["Name,Email", ...Array.from({ length: 501 }, (_, i) => `S${i},s${i}@example.com`)].join("\n");
    expect(parseRosterCsv(big).fileError).toMatch(/501 students; import at most 500/);
  });

  it("ignores a byte-order mark that spreadsheet programs put first", () => {
    expect(parseRosterCsv("\uFEFFName,Email\nAvery,avery@example.com").rows[0].email).toBe("avery@example.com");
  });
});
