// XML escaping for the JUnit report, read back by a maintained XML parser
// (fast-xml-parser). References: XML 1.0 (5th ed.) §2.2 Char (allowed
// characters), §2.4 (& and < must be escaped), §3.3.3 (attribute-value
// normalization turns a literal line break into a space; a reference keeps it).
import { XMLParser, XMLValidator } from "fast-xml-parser";
import { describe, expect, it } from "vitest";
import { xmlAttr, xmlText } from "../../../src/cli/formats/xml.ts";

const parser = new XMLParser({
  ignoreAttributes: false,
  attributeNamePrefix: "",
  parseTagValue: false,
  trimValues: false,
  processEntities: true,
  htmlEntities: false,
});

function roundTrip(value: string): { attr: string; text: string } {
  const doc = `<r a="${xmlAttr(value)}">${xmlText(value)}</r>`;
  expect(XMLValidator.validate(doc)).toBe(true);
  const r = (parser.parse(doc) as { r: { a: string; "#text"?: string } }).r;
  return { attr: r.a, text: r["#text"] ?? "" };
}

describe("xmlAttr and xmlText", () => {
  it.each([
    ["markup", '<failure message="x"/> & </testcase>'],
    ["quotes", `he said "no" and 'yes'`],
    ["a CDATA end", "]]> end"],
    ["non-ASCII", "±2.5 V, Ω, µA, 演算 🔌"],
  ])("carry %s unchanged", (_name, value) => {
    expect(roundTrip(value)).toEqual({ attr: value, text: value });
  });

  it("keeps line breaks and tabs in an attribute as references (§3.3.3)", () => {
    expect(xmlAttr("a\nb\tc")).toBe("a&#10;b&#9;c");
  });

  it("replaces characters XML 1.0 cannot carry (§2.2) with U+FFFD", () => {
    expect(xmlText("bell\u0007 esc\u001b lone\ud800 end\uffff")).toBe("bell\ufffd esc\ufffd lone\ufffd end\ufffd");
    expect(xmlText("pair \ud83d\udd0c stays")).toBe("pair \ud83d\udd0c stays");
  });
});
