// Every link goes through the base path, so the site works from a subfolder (SPEC §9).
import { describe, expect, it } from "vitest";
import { joinBase, linksFor, resultAnchor, roleAnchor } from "../../src/view/links.ts";

describe("joinBase", () => {
  it.each([
    ["/", "", "/"],
    ["/", "parts/x/", "/parts/x/"],
    ["/sub", "parts/x/", "/sub/parts/x/"],
    ["/sub/", "parts/x/", "/sub/parts/x/"],
    ["/team/railsieve/", "/catalogue/", "/team/railsieve/catalogue/"],
  ])("%j + %j → %j", (base, path, expected) => expect(joinBase(base, path)).toBe(expected));
});

describe("linksFor", () => {
  it.each(["/", "/team/railsieve/", "/team/railsieve"])("puts every page under the base %j", (base) => {
    const links = linksFor(base);
    const b = base.endsWith("/") ? base : `${base}/`;
    expect([
      links.homeUrl(),
      links.catalogueUrl(),
      links.rulesUrl(),
      links.tryUrl(),
      links.partUrl("oa-x"),
      links.designUrl("d1"),
    ]).toEqual([b, `${b}catalogue/`, `${b}rules/`, `${b}try/`, `${b}parts/oa-x/`, `${b}designs/d1/`]);
  });

  it("links to a part's entry in a role, a role, and a rule", () => {
    const links = linksFor("/sub/");
    expect(links.designUrl("d1", resultAnchor("buffer", "oa-x"))).toBe("/sub/designs/d1/#buffer--oa-x");
    expect(links.designUrl("d1", roleAnchor("pump-diode"))).toBe("/sub/designs/d1/#role-pump-diode");
    expect(links.rulesUrl("output-swing")).toBe("/sub/rules/#rule-output-swing");
  });
});
