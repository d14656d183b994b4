// The policy check the browser tests apply to every page's CSP meta tag.
// Directive semantics: W3C Content Security Policy Level 3 (§2.2 parsing, §6.8
// default-src fallback); what counts as "no other host" is issue 7 §5.
import { describe, expect, it } from "vitest";
import { parsePolicy, policyProblems, reportPolicyProblems } from "./csp.ts";

describe("parsePolicy", () => {
  it("lower-cases directive names and keeps the first of a repeated directive (CSP3 §2.2.1)", () => {
    expect([...parsePolicy("Script-Src 'self'; script-src *; img-src 'self' data:")]).toEqual([
      ["script-src", ["'self'"]],
      ["img-src", ["'self'", "data:"]],
    ]);
  });
});

describe("policyProblems", () => {
  it.each([
    [
      "the site's own policy",
      "default-src 'self'; script-src 'self'; style-src 'self'; img-src 'self' data:; object-src 'none'",
      [],
    ],
    ["default-src alone covering scripts and styles (CSP3 §6.8)", "default-src 'self'", []],
    ["no policy at all", null, ['no <meta http-equiv="Content-Security-Policy"> in <head>']],
    [
      "inline scripts allowed",
      "default-src 'self'; script-src 'self' 'unsafe-inline'",
      [
        "script-src allows 'self' 'unsafe-inline' (expected 'self' only)",
        "script-src allows 'unsafe-inline' (expected no unsafe keyword)",
      ],
    ],
    [
      "styles from a font host",
      "default-src 'self'; style-src 'self' https://fonts.example.com",
      [
        "style-src allows 'self' https://fonts.example.com (expected 'self' only)",
        "style-src allows https://fonts.example.com (expected no host but the site itself)",
      ],
    ],
    [
      "images from any host",
      "default-src 'self'; img-src *",
      ["img-src allows * (expected no host but the site itself)"],
    ],
    [
      "nothing restricted by default",
      "script-src 'self'; style-src 'self'",
      ["default-src is missing (anything not listed would be allowed from any host)"],
    ],
  ] as const)("%s", (_name, policy, problems) => {
    expect(policyProblems(policy)).toEqual(problems);
  });
});

describe("reportPolicyProblems", () => {
  it.each([
    [
      "the report's own policy",
      "default-src 'none'; style-src 'sha256-ffJ3rRWiy4KVE6YbNuMoACvtqbOhOEGIq1irZbT4Q/s='; img-src data:",
      [],
    ],
    [
      "the site's policy (loads from itself)",
      "default-src 'self'; style-src 'self'",
      [
        "default-src is not 'none'",
        "script-src allows 'self' (expected 'none')",
        "style-src allows 'self' (expected only hashes of the report's own style)",
      ],
    ],
    [
      "inline styles allowed",
      "default-src 'none'; style-src 'unsafe-inline'",
      [
        "style-src allows 'unsafe-inline' (expected only hashes of the report's own style)",
        "style-src allows 'unsafe-inline' (expected no unsafe keyword)",
      ],
    ],
  ] as const)("%s", (_name, policy, problems) => {
    expect(reportPolicyProblems(policy)).toEqual(problems);
  });
});
