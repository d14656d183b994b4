// The built site (issue 4 acceptance): one build of the demo data per run, under
// a sub-folder base path, then every file is read back. No broken internal link
// or fragment, no reference to another host, nothing the Content-Security-Policy
// would block (inline script, style attribute, <style>), one h1 per page, and the
// pages the issue asks for with the numbers the engine computed.
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join, relative, resolve, sep } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { evaluateDesign } from "../../src/engine.ts";
import type { RoleResult } from "../../src/core/engine/result.ts";
import { loadDataSet } from "../../src/node/load-data.ts";
import { escapeHtml } from "../../src/view/escape.ts";
import { CAUTION_TEXT, FITS_IN_FULL } from "../../src/view/design-view.ts";
import { RANKING_KEYS, rankingKeys, rejectionGroups } from "../../src/view/role-lists.ts";
import { closestFinding, decidingFinding } from "../../src/view/deciding.ts";
import { RULES } from "../../rules/index.ts";
import { buildSite } from "../e2e/harness/build-site.ts";

const BASE = "/guide/";
const ORIGIN = "http://railsieve.test";
const DATA = resolve(import.meta.dirname, "../../data");
const CSP =
  "default-src 'self'; script-src 'self'; style-src 'self'; img-src 'self' data:; connect-src 'self'; object-src 'none'; base-uri 'self'; form-action 'self'";

type Site = { dir: string; files: string[]; html: Map<string, string> };
let tmp: string;
let site: Site;
const data = loadDataSet(DATA);

/** The few entities Astro writes inside attribute values. */
function decode(text: string): string {
  return text
    .replace(/&quot;/g, '"')
    .replace(/&#39;/g, "'")
    .replace(/&#x27;/g, "'")
    .replace(/&lt;/g, "<")
    .replace(/&gt;/g, ">")
    .replace(/&amp;/g, "&");
}

function walk(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) =>
    e.isDirectory() ? walk(join(dir, e.name)) : [join(dir, e.name)],
  );
}

/** The address a file is served at: dist/parts/x/index.html → /guide/parts/x/. */
function addressOf(file: string): string {
  const rel = relative(site.dir, file).split(sep).join("/");
  return BASE + rel.replace(/(^|\/)index\.html$/, "$1");
}

/** The file a local address serves, as a plain static server would (directory → index.html). */
function fileFor(pathname: string): string | undefined {
  const rel = decodeURIComponent(pathname.slice(BASE.length));
  const candidates = rel === "" || rel.endsWith("/") ? [`${rel}index.html`] : [rel, `${rel}/index.html`];
  return candidates.map((c) => join(site.dir, c)).find((f) => existsSync(f) && !f.endsWith(sep));
}

/** Every URL a page or stylesheet asks for or links to. */
function referencesIn(file: string, text: string): string[] {
  if (file.endsWith(".css"))
    return [...text.matchAll(/url\(\s*(['"]?)([^'")]*)\1\s*\)|@import\s+(['"])([^'"]*)\3/g)].map(
      (m) => m[2] ?? m[4] ?? "",
    );
  const attrs = [...text.matchAll(/\s(?:href|src|action|formaction|poster|xlink:href|srcset)\s*=\s*"([^"]*)"/g)].map(
    (m) => decode(m[1] ?? ""),
  );
  return attrs.flatMap((v) => v.split(",").map((s) => s.trim().split(/\s+/)[0] ?? "")).filter((v) => v !== "");
}

function ids(html: string): Set<string> {
  return new Set([...html.matchAll(/\sid="([^"]*)"/g)].map((m) => decode(m[1] ?? "")));
}

/**
 * The site's own pages. A design's one-file report (designs/<id>/report.html)
 * is a download with its own stricter policy and its style inside, checked by
 * test/view/design-report.test.ts and the browser tests.
 */
function sitePages(): [string, string][] {
  return [...site.html].filter(([address]) => !address.endsWith("/report.html"));
}

function page(address: string): string {
  const html = site.html.get(address);
  if (html === undefined)
    throw new Error(`no page at ${address}; pages: ${[...site.html.keys()].slice(0, 5).join(", ")}…`);
  return html;
}

beforeAll(async () => {
  expect(data.problems).toEqual([]);
  tmp = mkdtempSync(join(tmpdir(), "railsieve-site-"));
  const dir = join(tmp, "site");
  await buildSite({ dataDir: DATA, outDir: dir, base: BASE });
  const files = walk(dir);
  site = { dir, files, html: new Map() };
  for (const f of files.filter((f) => f.endsWith(".html"))) site.html.set(addressOf(f), readFileSync(f, "utf8"));
}, 120_000);

afterAll(() => {
  if (tmp) rmSync(tmp, { recursive: true, force: true });
});

describe("the built site", () => {
  it("has a page for every part class and every design, the catalogue and each kind's, the rules and the home page", () => {
    const expected = [
      BASE,
      `${BASE}catalogue/`,
      ...["op-amps", "comparators", "diodes"].map((k) => `${BASE}catalogue/${k}/`),
      `${BASE}rules/`,
      ...data.catalogue.parts.map((p) => `${BASE}parts/${p.id}/`),
      ...data.designs.map((d) => `${BASE}designs/${d.design?.id}/`),
    ];
    expect(expected.filter((a) => !site.html.has(a))).toEqual([]);
  });

  it("has no broken internal link, asset or fragment, and stays under its base path", () => {
    const broken: string[] = [];
    const idsOf = new Map<string, Set<string>>();
    for (const file of site.files.filter((f) => f.endsWith(".html") || f.endsWith(".css"))) {
      const from = file.endsWith(".html") ? addressOf(file) : `/${relative(site.dir, file).split(sep).join("/")}`;
      const base = new URL(
        file.endsWith(".css") ? `${BASE}${relative(site.dir, file).split(sep).join("/")}` : from,
        ORIGIN,
      );
      for (const ref of referencesIn(file, readFileSync(file, "utf8"))) {
        const url = new URL(ref, base);
        if (url.origin !== ORIGIN || url.protocol === "data:") continue; // other hosts: next test
        if (!url.pathname.startsWith(BASE)) {
          broken.push(`${from}: ${ref} leaves the base path ${BASE}`);
          continue;
        }
        const target = fileFor(url.pathname);
        if (!target) {
          broken.push(`${from}: ${ref} (no file)`);
          continue;
        }
        if (url.hash !== "" && target.endsWith(".html")) {
          const known = idsOf.get(target) ?? ids(readFileSync(target, "utf8"));
          idsOf.set(target, known);
          if (!known.has(decodeURIComponent(url.hash.slice(1))))
            broken.push(`${from}: ${ref} (no element with that id)`);
        }
      }
    }
    expect(broken, broken.join("\n")).toEqual([]);
  });

  it("refers to no other host in any src, href, action or CSS url()", () => {
    const external: string[] = [];
    for (const file of site.files.filter((f) => f.endsWith(".html") || f.endsWith(".css"))) {
      for (const ref of referencesIn(file, readFileSync(file, "utf8"))) {
        const url = new URL(ref, `${ORIGIN}${BASE}`);
        const runs = /^(javascript|vbscript):/i.test(ref);
        const inline = url.protocol === "data:" && !/^data:image\//i.test(ref);
        if (url.origin !== ORIGIN || runs || inline) {
          if (url.protocol === "data:" && !inline) continue;
          external.push(`${relative(site.dir, file)}: ${ref}`);
        }
      }
    }
    expect(external).toEqual([]);
  });

  it("has nothing its Content-Security-Policy would block: no inline script, style attribute, <style> or on… handler", () => {
    const found: string[] = [];
    for (const [address, html] of sitePages()) {
      for (const m of html.matchAll(/<script\b([^>]*)>([\s\S]*?)<\/script>/g)) {
        const attrs = m[1] ?? "";
        if (/type="application\/(ld\+)?json"/.test(attrs)) continue;
        if (!/\ssrc="/.test(attrs) || (m[2] ?? "").trim() !== "") found.push(`${address}: inline <script${attrs}>`);
      }
      for (const m of html.matchAll(/<[a-z][^>]*\sstyle\s*=\s*["'][^>]*>/gi))
        found.push(`${address}: ${m[0].slice(0, 80)}`);
      for (const m of html.matchAll(/<style\b/gi)) found.push(`${address}: ${m[0]}`);
      for (const m of html.matchAll(/<[a-z][^>]*\son[a-z]+\s*=\s*["'][^>]*>/gi))
        found.push(`${address}: ${m[0].slice(0, 80)}`);
    }
    expect(found).toEqual([]);
  });

  it("declares the policy, the language and one h1 on every page", () => {
    const wrong: string[] = [];
    for (const [address, html] of sitePages()) {
      const meta = /<meta http-equiv="Content-Security-Policy" content="([^"]*)"/.exec(html);
      if (!meta || decode(meta[1] ?? "") !== CSP) wrong.push(`${address}: policy ${meta?.[1] ?? "missing"}`);
      if (!html.includes('<html lang="en"')) wrong.push(`${address}: no lang="en"`);
      const h1 = html.match(/<h1\b/g)?.length ?? 0;
      if (h1 !== 1) wrong.push(`${address}: ${h1} h1`);
      if (!/<a class="skip-link" href="#main">/.test(html) || !html.includes('<main id="main"'))
        wrong.push(`${address}: no skip link to main`);
      for (const bad of ["undefined", "NaN", "[object Object]"])
        if (html.replace(/<[^>]*>/g, " ").includes(bad)) wrong.push(`${address}: shows ${bad}`);
    }
    expect(wrong).toEqual([]);
  });

  it("gives every table header a scope and every form field a label", () => {
    const wrong: string[] = [];
    for (const [address, html] of site.html) {
      for (const m of html.matchAll(/<th\b[^>]*>/g))
        if (!/\sscope="(col|row)"/.test(m[0])) wrong.push(`${address}: ${m[0]}`);
      for (const m of html.matchAll(/<(input|select)\b[^>]*\sid="([^"]*)"/g)) {
        if (!html.includes(`<label for="${m[2]}"`)) wrong.push(`${address}: #${m[2]} has no label`);
      }
    }
    expect(wrong).toEqual([]);
  });
});

/** The one element with this id: from its opening tag to the matching close of `tag` (no nesting of `tag` inside). */
function elementWithId(html: string, tag: string, id: string): string {
  const at = html.indexOf(` id="${id}"`);
  if (at < 0) return "";
  const start = html.lastIndexOf(`<${tag}`, at);
  return html.slice(start, html.indexOf(`</${tag}>`, at) + tag.length + 3);
}

function evaluated(id: string) {
  const design = data.designs.find((d) => d.design?.id === id)?.design;
  if (!design) throw new Error(`demo design ${id} is missing from data/designs`);
  const evaluation = evaluateDesign(design, data.catalogue);
  if (!evaluation.ok) throw new Error(`demo design ${id} does not evaluate`);
  return evaluation.result;
}

function roleSection(designId: string, name: string): string {
  const html = page(`${BASE}designs/${designId}/`);
  const start = html.indexOf(`<section class="role" id="role-${name}"`);
  expect(start).toBeGreaterThan(0);
  // A role section holds sections of its own (the rejection groups): it ends where the next role or the page's main ends.
  const next = [html.indexOf('<section class="role"', start + 1), html.indexOf("</main>", start)].filter((i) => i > 0);
  return html.slice(start, Math.min(...next));
}

const listedIn = (html: string, pattern: RegExp) => [...html.matchAll(pattern)].map((m) => m[1]);

describe("a demo design page: bridge-10v-5v-adc", () => {
  const result = evaluated("bridge-10v-5v-adc");
  const role = (name: string) => result.roles.find((r) => r.role === name) as RoleResult;
  const section = (name: string) => roleSection("bridge-10v-5v-adc", name);
  /** The part page's entry for this design's buffer. */
  const partEntry = (id: string) => elementWithId(page(`${BASE}parts/${id}/`), "li", "in-bridge-10v-5v-adc--buffer");

  it("draws the best fits in full with a rail diagram each, and lists every rejection once, one line each", () => {
    const buffer = section("buffer");
    const fits = role("buffer").fits;
    const inFull = Math.min(fits.length, FITS_IN_FULL);
    expect(fits.length).toBeGreaterThan(0);
    expect(buffer.match(/<svg class="rail-diagram"/g)?.length).toBe(inFull);
    expect(listedIn(buffer, /<li class="result result-[a-z]+" id="buffer--([a-z0-9-]+)"/g)).toEqual(
      fits.slice(0, inFull).map((p) => p.part.id),
    );
    // Each fit in full shows its own ranking keys: status, cost band and least relative margin.
    for (const p of fits.slice(0, inFull)) {
      const entry = elementWithId(buffer, "li", `buffer--${p.part.id}`);
      expect(entry).toContain(`<span class="mark">least margin ${rankingKeys(p).margin}</span>`);
      expect(entry).toContain(`<span class="mark">${p.part.status}</span>`);
    }
    const rejected = role("buffer").rejected;
    expect(rejected.length).toBeGreaterThan(0);
    const lines = listedIn(buffer, /<li><a href="\.\.\/\.\.\/parts\/([a-z0-9-]+)\/index\.html">/g);
    expect([...lines].sort()).toEqual(rejected.map((p) => p.part.id).sort());
  });

  it("groups the rejections by the rule that decides them: count, shortfall range and an example with its numbers", () => {
    const buffer = section("buffer");
    const groups = rejectionGroups(role("buffer"));
    expect(groups.reduce((n, g) => n + g.parts.length, 0)).toBe(role("buffer").rejected.length);
    for (const g of groups) {
      const head = new RegExp(
        `<p class="reject-head"><a href="[^"]*#rule-${g.rule}">${g.rule}</a>: <strong>${g.parts.length}</strong> parts? `,
      );
      expect(buffer, g.rule).toMatch(head);
      const example = g.parts[0]!;
      expect(buffer, g.rule).toContain(`For example ${example.result.part.id}: ${escapeHtml(example.finding.reason)}`);
      // A yes/no rule (unit "", e.g. unity-gain-stable) has no number to show.
      if (g.verdict === "fail" && example.finding.unit !== "")
        expect(example.finding.reason, g.rule).toMatch(
          /\d(\.\d+)? ?(V|mV|µV|nV|A|mA|µA|nA|pA|s|ms|µs|ns|Hz|kHz|MHz|V\/µs|mV\/µs|Ω|kΩ)\b/,
        );
    }
  });

  it("gives each part one line per design and role on its page, with the verdict and the finding that decides it", () => {
    for (const r of role("buffer").rejected) {
      const html = partEntry(r.part.id);
      expect(html, r.part.id).toContain(`<span class="verdict verdict-${r.verdict}">`);
      const deciding = decidingFinding(r);
      expect(deciding, r.part.id).toBeDefined();
      expect(html, r.part.id).toContain(escapeHtml(deciding!.reason));
      expect(html).toContain(`href="../../designs/bridge-10v-5v-adc/index.html#role-buffer"`);
    }
  });

  it("files the split-supply class under the rule that decides it: 8.98 V across the rails, rated from 10 V, 1.02 V short", () => {
    // SPEC §6, §11.5: the pump carries 0.5 mA stated + 2 × 0.2 mA + 2 × 3 mA + 0.6 mA = 7.5 mA; each Schottky
    // conducts 15 mA: Vf = 0.32 + 0.10·log10(15) = 0.438 V at 25 °C, + 2 mV/°C × 25 °C at the 0 °C cold end
    // = 0.488 V (Sedra & Smith); V− = −(5 − 0.975) + 7.5 mA/(20 kHz · 10 µF) + ½ · 7.5 mA/(20 kHz · 22 µF)
    // = −3.979 V (Winder), so the op amp sees 8.98 V against its 10 V minimum: 1.02 V short.
    const supply = rejectionGroups(role("buffer")).find((g) => g.rule === "supply-range");
    expect(supply?.parts.map((p) => p.result.part.id)).toContain("oa-bip-split-gp");
    expect(section("buffer")).toContain("oa-bip-split-gp</a> 1.02 V short</li>");
    expect(partEntry("oa-bip-split-gp")).toContain(
      "needs a supply of 8.98 V (V+ 5.00 V, V− −3.98 V); rated 10.00 V to 36.00 V: 1.02 V short",
    );
  });

  it("shows the derived values: pumped rail with droop and ripple, divider, window, ADC step", () => {
    const html = page(`${BASE}designs/bridge-10v-5v-adc/`);
    // Droop 7.5 mA/(20 kHz · 10 µF) = 37.5 mV, ripple 7.5 mA/(20 kHz · 22 µF) = 17.0 mV; E24 47k/16k behind the
    // 1 kΩ source: 16/(1 + 47 + 16) = 0.25 (SPEC §11.1, loaded ratio);
    // ADC step (5 V / 1024) / 0.25 = 19.5 mV (IEEE Std 1241-2010, Q = V_FS / 2^N).
    for (const text of [
      "<dd>37.5 mV</dd>",
      "<dd>17 mV</dd>",
      "<dd>−3.98 V</dd>",
      "<dd>47 kΩ</dd>",
      "<dd>16 kΩ</dd>",
      "<dd>1 kΩ</dd>",
      "<dd>0.25</dd>",
      "<dd>±2.50 V</dd>",
      "<dd>19.5 mV</dd>",
    ]) {
      expect(html).toContain(text);
    }
  });

  it("carries the safety caution only above 30 V", () => {
    expect(page(`${BASE}designs/bus-48v/`)).toContain(CAUTION_TEXT);
    expect(page(`${BASE}designs/bridge-10v-5v-adc/`)).not.toContain(CAUTION_TEXT);
  });
});

describe("a long shortlist: vibration-2v-split-2v5's buffer", () => {
  const buffer = evaluated("vibration-2v-split-2v5").roles.find((r) => r.role === "buffer") as RoleResult;
  const section = () => roleSection("vibration-2v-split-2v5", "buffer");

  it("draws the first fits in full, then the others one row each in rank order, with their ranking keys", () => {
    expect(buffer.fits.length).toBeGreaterThan(FITS_IN_FULL);
    const html = section();
    const [top, rest] = html.split('<table class="fits-summary"');
    expect(listedIn(top ?? "", /<li class="result result-[a-z]+" id="buffer--([a-z0-9-]+)"/g)).toEqual(
      buffer.fits.slice(0, FITS_IN_FULL).map((p) => p.part.id),
    );
    // The ranking's keys are stated once, in the page's summary; each row shows its own.
    expect(page(`${BASE}designs/vibration-2v-split-2v5/`).split(escapeHtml(RANKING_KEYS)).length - 1).toBe(1);
    const restHtml = (rest ?? "").slice(0, (rest ?? "").indexOf("</table>"));
    const rows = [...restHtml.matchAll(/<tr><td>(\d+)<\/td><th scope="row"><a href="[^"]*">([a-z0-9-]+)<\/a>/g)];
    expect(rows.map((m) => m[2])).toEqual(buffer.fits.slice(FITS_IN_FULL).map((p) => p.part.id));
    expect(rows.map((m) => m[1])).toEqual(buffer.fits.slice(FITS_IN_FULL).map((_, i) => String(FITS_IN_FULL + 1 + i)));
    for (const p of buffer.fits.slice(FITS_IN_FULL)) {
      const k = rankingKeys(p);
      expect(restHtml).toContain(`>${p.part.id}</a>`);
      expect(restHtml, p.part.id).toMatch(
        new RegExp(
          `>${p.part.id}</a>.*?(<td>pass|<td class="v-marginal">marginal)</td><td>${k.status}</td><td>${k.cost}</td><td>${k.margin}</td>`,
        ),
      );
    }
    expect(html.match(/<svg class="rail-diagram"/g)?.length).toBe(FITS_IN_FULL);
  });
});

describe("the other pages", () => {
  it("lists every class on the catalogue's front page, one line each, with JavaScript off", () => {
    const html = page(`${BASE}catalogue/`);
    const rows = (html.match(/<tbody>.*?<\/tbody>/gs) ?? []).join("").match(/<tr[ >]/g) ?? [];
    expect(rows.length).toBe(data.catalogue.parts.length);
    for (const header of ["Id", "Name", "Status", "Tags"]) expect(html).toContain(`>${header}</th>`);
    // The parameters are on each kind's page, linked from here.
    expect(html).not.toContain(">Gain-bandwidth (MHz)</th>");
    for (const k of ["op-amps", "comparators", "diodes"]) expect(html).toContain(`href="${k}/index.html"`);
    expect(html).toMatch(/<form class="filters" id="catalogue-filters"[^>]*hidden/);
    // A classic script (it also runs from a folder opened from disk), linked relative to the page.
    expect(html).toMatch(/<script defer src="\.\.\/scripts\/catalogue\.js"><\/script>/);
  });

  it.each([
    ["op-amps", "op-amp", ["Offset max (mV)", "Bias current max (nA)", "Gain-bandwidth (MHz)", "Slew rate (V/µs)"]],
    ["comparators", "comparator", ["Propagation delay (ns)"]],
    ["diodes", "diode", ["Reverse leakage (nA)"]],
  ])("lists every %s class with every parameter, units in the headers, with JavaScript off", (path, kind, headers) => {
    const html = page(`${BASE}catalogue/${path}/`);
    const rows = (html.match(/<tbody>.*?<\/tbody>/gs) ?? []).join("").match(/<tr[ >]/g) ?? [];
    expect(rows.length).toBe(data.catalogue.parts.filter((p) => p.kind === kind).length);
    for (const header of headers) expect(html).toContain(`>${header}</th>`);
    expect(html).toMatch(/<form class="filters" id="catalogue-filters"[^>]*hidden/);
    expect(html).not.toContain('id="catalogue-kind"');
    expect(html).toMatch(/<script defer src="\.\.\/\.\.\/scripts\/catalogue\.js"><\/script>/);
    // An empty cell says so to a screen reader, and sorts last (class nr).
    expect(html).toContain(
      '<td class="nr"><span aria-hidden="true">—</span><span class="visually-hidden">not rated</span></td>',
    );
  });

  it("shows a part's parameters in SI and its verdict in every design", () => {
    const html = page(`${BASE}parts/oa-cmos-rrio-1m/`);
    for (const text of [
      "<dd>1 MHz</dd>",
      "<dd>10 pA</dd>",
      "<dd>−0.1 V beyond the rail</dd>",
      "<dd>0.02 V inside the rail</dd>",
      "<dd>0.6 V/µs</dd>",
      "<dd>100 µA</dd>",
    ]) {
      expect(html).toContain(text);
    }
    // One line per design and role that weighed it, none per design without it.
    const lines = html.match(/<li id="in-[a-z0-9-]+--[a-z-]+">/g) ?? [];
    expect(lines.length).toBeGreaterThanOrEqual(data.designs.length);
  });

  it("gives a part every role of every design, the compared topology's roles included", () => {
    const id = "oa-cmos-rrio-1m";
    const html = page(`${BASE}parts/${id}/`);
    for (const d of data.designs) {
      const result = evaluated(d.design!.id);
      const results = [result, ...(result.comparison?.results.filter((r) => r.topology !== result.topology) ?? [])];
      for (const r of results.flatMap((x) => x.roles)) {
        const place = [...r.fits, ...r.rejected].find((p) => p.part.id === id);
        if (!place) continue;
        const anchor = `in-${d.design!.id}--${r.role}`;
        const entry = elementWithId(html, "li", anchor);
        expect(entry, anchor).toContain(`<span class="verdict verdict-${place.verdict}">`);
        const fit = r.fits.includes(place);
        expect(entry, anchor).toContain(
          fit ? `fit, rank ${r.fits.indexOf(place) + 1} of ${r.fits.length}` : "rejected",
        );
        const said = closestFinding(place);
        if (said) expect(entry, anchor).toContain(escapeHtml(said.reason));
      }
    }
    expect(html).toContain('id="in-audio-1v5-20k--level-shift"');
  });

  it("explains every rule with its formula, columns, policy knob and source", () => {
    const html = page(`${BASE}rules/`);
    for (const rule of RULES) {
      const start = html.indexOf(`id="rule-${rule.id}"`);
      expect(start, rule.id).toBeGreaterThan(0);
      const part = html.slice(start, html.indexOf("</section>", start));
      expect(part).toContain(escapeHtml(rule.formula));
      expect(part).toContain(escapeHtml(rule.source));
      expect(part).toContain(escapeHtml(rule.checks));
      if (rule.policy) expect(part).toContain(`<code>${rule.policy}</code>`);
    }
  });

  it("offers each design's one-file report: linked from its page, loading nothing", () => {
    for (const d of data.designs) {
      const id = d.design?.id ?? "";
      expect(page(`${BASE}designs/${id}/`)).toMatch(/<a href="report\.html" download="[a-z0-9-]+-review\.html">/);
      const report = page(`${BASE}designs/${id}/report.html`);
      expect(report).toMatch(
        /<meta http-equiv="Content-Security-Policy" content="default-src 'none'; style-src 'sha256-[A-Za-z0-9+/=]+'; /,
      );
      expect(report).not.toMatch(/<(script|link|img|iframe)\b/);
      expect(report.match(/\shref="(?!#)[^"]*"/g) ?? []).toEqual([]);
    }
  });

  it("states each design's state and the catalogue counts on the home page", () => {
    const html = page(BASE);
    for (const d of data.designs) expect(html).toContain(`href="designs/${d.design?.id}/index.html"`);
    expect(html).toMatch(/<td class="num">\d+<\/td>/);
    expect(html).toMatch(/Built on <time datetime="\d{4}-\d\d-\d\dT[^"]+">\d{4}-\d\d-\d\d<\/time>/);
  });
});
