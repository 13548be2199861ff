// CSV cells by RFC 4180 §2 (fields with commas, quotes or line breaks are
// quoted; a quote inside is doubled; lines end with CRLF) and the OWASP
// "CSV injection" advice (a cell starting with = + - @ is not run as a
// formula); and the PDF's text cleaning to what the standard font encodes
// (WinAnsiEncoding, PDF 32000-1 Annex D).
import { describe, expect, it } from "vitest";
import { csvCell, toCsv } from "@/lib/export/csv";
import { winAnsi } from "@/lib/print/pdf";

describe("CSV (RFC 4180)", () => {
  it("quotes only what needs quoting and doubles quotes", () => {
    expect(csvCell("plain")).toBe("plain");
    expect(csvCell("a,b")).toBe('"a,b"');
    expect(csvCell('say "hi"')).toBe('"say ""hi"""');
    expect(csvCell("two\nlines")).toBe('"two\nlines"');
    expect(csvCell(null)).toBe("");
    expect(csvCell(6.5)).toBe("6.5");
    expect(csvCell(false)).toBe("false");
  });

  it("defuses spreadsheet formulas in text cells, not in numbers", () => {
    expect(csvCell("=HYPERLINK(1)")).toBe("'=HYPERLINK(1)");
    expect(csvCell("@SUM(A1)")).toBe("'@SUM(A1)");
    expect(csvCell("-2+3")).toBe("'-2+3");
    expect(csvCell(-2)).toBe("-2");
  });

  it("writes a header and CRLF-terminated records", () => {
    expect(toCsv([{ a: 1, b: "x,y" }], [["a", (r) => r.a], ["b", (r) => r.b]])).toBe('a,b\r\n1,"x,y"\r\n');
  });
});

describe("PDF text", () => {
  it("keeps Latin-1 and the WinAnsi typographic marks, replaces the rest", () => {
    expect(winAnsi("Größe · 3.2 mm — “ok” €")).toBe("Größe · 3.2 mm — “ok” €");
    expect(winAnsi("≈3 mm, ≥ 1.6")).toBe("~3 mm, >= 1.6");
    expect(winAnsi("ŁódŹ 東")).toBe("?ód? ?");
  });
});
