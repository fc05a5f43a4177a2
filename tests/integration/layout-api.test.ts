import { describe, expect, inject, it } from "vitest";

const baseURL = inject("baseURL");

async function post(path: string, body: unknown) {
  const res = await fetch(`${baseURL}/api/layout/${path}`, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(body) });
  return { status: res.status, body: await res.json() };
}

describe("POST /api/layout/even-spacing", () => {
  it("lays out the 128 3/4\" wall with six 2 1/2\" verticals", async () => {
    // common practice, no source: five bays of 22 3/4"; the second vertical's left edge at 25 1/4".
    const { status, body } = await post("even-spacing", { span: "128 3/4", memberWidth: "2 1/2", count: 6, endCondition: "members" });
    expect(status).toBe(200);
    expect(body.count).toBe(6);
    expect(body.spaces).toBe(5);
    expect(body.gap).toEqual({ exact: "91/4", value: 22.75, text: `22 3/4"` });
    expect(body.onCenter.exact).toBe("101/4");
    expect(body.members[1].start).toEqual({ exact: "101/4", value: 25.25, text: `25 1/4"` });
    expect(body.members).toHaveLength(6);
    expect(body.warnings).toEqual([]);
  });

  it("accepts numbers of inches and millimetres, answering in the unit asked", async () => {
    const { status, body } = await post("even-spacing", { span: 3270.25, memberWidth: 63.5, count: 6, unit: "mm" });
    expect(status).toBe(200);
    // 128 3/4" = 3270.25 mm and 2 1/2" = 63.5 mm exactly (1" = 25.4 mm): the gap is 22 3/4" = 577.85 mm.
    expect(body.gap.exact).toBe("11557/20");
    expect(body.gap.value).toBeCloseTo(577.85, 10);
  });

  it.each([
    [{ memberWidth: "2 1/2", count: 6 }, "span"],
    [{ span: "12 3/", memberWidth: "2 1/2", count: 6 }, "span"],
    [{ span: "96", memberWidth: "-1", count: 6 }, "memberWidth"],
    [{ span: "96", memberWidth: "2 1/2" }, "count"],
    [{ span: "96", memberWidth: "2 1/2", count: 6, maxGap: "4" }, "count"],
    [{ span: "96", memberWidth: "2 1/2", count: 1.5 }, "count"],
    [{ span: "96", memberWidth: "2 1/2", count: 6, denominator: 10 }, "denominator"],
    [{ span: "96", memberWidth: "2 1/2", count: 6, unit: "cubits" }, "unit"],
  ])("rejects %j with a 400 naming %s", async (body, field) => {
    const res = await post("even-spacing", body);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe("bad_request");
    expect(Object.keys(res.body.error.fields)).toContain(field);
    expect(typeof res.body.error.fields[field]).toBe("string");
  });

  it("rejects a body that is not JSON", async () => {
    const res = await fetch(`${baseURL}/api/layout/even-spacing`, { method: "POST", body: "span=96" });
    expect(res.status).toBe(400);
  });
});

describe("POST /api/layout/guard-spacing", () => {
  it("puts 13 balusters in 72\" so every opening is under 4\"", async () => {
    // A general how-to page (medium confidence): 72" between posts, 1 1/2" balusters → 13, gap 3 3/4".
    const { status, body } = await post("guard-spacing", { span: "72", balusterWidth: "1 1/2" });
    expect(status).toBe(200);
    expect(body.count).toBe(13);
    expect(body.spaces).toBe(14);
    expect(body.gap.exact).toBe("15/4");
  });

  it("names a bad baluster width", async () => {
    const res = await post("guard-spacing", { span: "72", balusterWidth: "wide" });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty("balusterWidth");
  });
});

describe("POST /api/layout/stairs", () => {
  it("works the 94\" rise of the Army carpentry manual", async () => {
    // US Army EN5156 §2-19/20: 94" → 13 risers of 7 1/4" (to the 1/16").
    const { status, body } = await post("stairs", { totalRise: "94" });
    expect(status).toBe(200);
    expect(body.riserCount).toBe(13);
    expect(body.riserHeight.rounded.text).toBe(`7 1/4"`);
  });

  it("refuses both a total run and a tread depth", async () => {
    const res = await post("stairs", { totalRise: "94", totalRun: "126", treadDepth: "10 1/2" });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty("treadDepth");
  });
});

describe("POST /api/layout/measure", () => {
  it("reads tape notation and reports the rounding", async () => {
    const { status, body } = await post("measure", { text: `1' 10 3/4"`, style: "feet-inches" });
    expect(status).toBe(200);
    expect(body.kind).toBe("length");
    expect(body.exact).toEqual({ exact: "91/4", value: 22.75, text: `1' 10 3/4"` });
  });

  it("works arithmetic on measurements with plain multipliers", async () => {
    // 3 × 2 1/2" = 7 1/2" (arithmetic).
    const { body } = await post("measure", { text: `3 × 2 1/2"`, style: "inches" });
    expect(body.exact.text).toBe(`7 1/2"`);
    const fits = await post("measure", { text: `96 ÷ 24"` });
    expect(fits.body).toEqual({ kind: "number", exact: "4", value: 4 });
  });

  it("says where it could not read the text", async () => {
    const res = await post("measure", { text: "22 3/0" });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.text).toMatch(/character \d+/);
  });
});

describe("POST /api/layout/cut-list", () => {
  it("needs two boards for four 24\" pieces from 96\" stock with a 1/8\" kerf", async () => {
    // common practice, no source: three kerfs of 1/8" make the last of four 24" pieces 3/8" short.
    const { status, body } = await post("cut-list", { pieces: [{ label: "Rail", length: "24", quantity: 4 }], stock: [{ length: "96" }], kerf: "1/8" });
    expect(status).toBe(200);
    expect(body.boardCount).toBe(2);
    expect(body.optimal).toBe(true);
    expect(body.boards.flatMap((b: { cuts: unknown[] }) => b.cuts)).toHaveLength(4);
  });

  it("fits them on one board with no kerf", async () => {
    const { body } = await post("cut-list", { pieces: [{ label: "Rail", length: "24", quantity: 4 }], stock: [{ length: "96" }], kerf: "0" });
    expect(body.boardCount).toBe(1);
  });

  it("names the bad row", async () => {
    const res = await post("cut-list", { pieces: [{ label: "Rail", length: "24", quantity: 4 }, { label: "Stile", length: "abc", quantity: 1 }], stock: [{ length: "96" }] });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty("pieces.1.length");
  });
});

describe("POST /api/layout/wall-grid", () => {
  it("cuts the verticals 84\" on a 96\" wall with a 5 1/2\" top board, 2 1/2\" bottom rail and 4\" base trim", async () => {
    // common practice, no source: 96 − 5 1/2 − 2 1/2 − 4 = 84; six 2 1/2" verticals on 128 3/4" leave 22 3/4" bays.
    const { status, body } = await post("wall-grid", {
      wallWidth: "128 3/4",
      wallHeight: "96",
      topRailWidth: "5 1/2",
      bottomRailWidth: "2 1/2",
      baseTrimHeight: "4",
      verticalWidth: "2 1/2",
      verticalCount: 6,
      rows: 0,
    });
    expect(status).toBe(200);
    expect(body.verticalLength.exact.exact).toBe("84");
    expect(body.bay.exact.exact).toBe("91/4");
  });
});

describe("request size limits", () => {
  it("refuses a cut list of more than 2,000 pieces before doing any work", async () => {
    const pieces = Array.from({ length: 10 }, (_, i) => ({ label: `P${i}`, length: "12", quantity: 500 }));
    const res = await post("cut-list", { pieces, stock: [{ length: "96" }] });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.pieces).toMatch(/at most 2,000/);
  });
});
