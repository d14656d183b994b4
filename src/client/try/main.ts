// The try page's script: fetch the catalogue once, then on every edit run the
// same engine the site and the CLI use, redraw the results and keep the design
// in the address bar. Nothing here throws to the console: a failed fetch or a
// bad link becomes a message on the page.
import { indexCatalogue, type Catalogue } from "../../core/catalogue-index.ts";
import type { DesignResult, Evaluation } from "../../core/engine/result.ts";
import { formatProblem, type Problem } from "../../core/problems.ts";
import type { Design } from "../../core/schemas/design.ts";
import { needsCaution } from "../../view/design-view.ts";
import { joinBase, setSiteBase } from "../../view/links.ts";
import { DEFAULT_DRAFT } from "./defaults.ts";
import { checkDraft, draftFromInput } from "./draft.ts";
import { areLoaded, evaluateDesign, loadTopologies, topologiesFor } from "./engine.ts";
import { FIELD_BY_PATH, type Draft } from "./fields.ts";
import { fillPartLists, readField, showApplicable, showParsed, showProblems, writeDraft } from "./form.ts";
import { renderTry } from "./render.ts";
import { holdsLine } from "../../view/render-results.ts";
import { readTryData, TRY_DATA_PATH, type TryData } from "./try-data.ts";
import { decodeQuery, encodeDraft, stateFromUrl, type UrlState } from "./url-state.ts";
import { TOPOLOGY_META } from "../../topologies/meta.ts";

type Page = {
  root: HTMLElement;
  form: HTMLFormElement;
  formProblems: HTMLElement;
  linkProblems: HTMLElement;
  status: HTMLElement;
  results: HTMLElement;
  caution: HTMLElement;
  start: HTMLSelectElement;
  load: HTMLButtonElement;
  downloadDesign: HTMLButtonElement;
  downloadCsv: HTMLButtonElement;
  downloadMessage: HTMLElement;
};

function find(doc: Document): Page | undefined {
  const get = <T extends HTMLElement>(id: string, type: new () => T): T | undefined => {
    const el = doc.getElementById(id);
    return el instanceof type ? el : undefined;
  };
  const page = {
    root: get("try", HTMLElement),
    form: get("try-form", HTMLFormElement),
    formProblems: get("try-form-problems", HTMLElement),
    linkProblems: get("try-link-problems", HTMLElement),
    status: get("try-status", HTMLElement),
    results: get("try-results", HTMLElement),
    caution: get("try-caution", HTMLElement),
    start: get("try-start", HTMLSelectElement),
    load: get("try-load", HTMLButtonElement),
    downloadDesign: get("try-download-design", HTMLButtonElement),
    downloadCsv: get("try-download-csv", HTMLButtonElement),
    downloadMessage: get("try-download-message", HTMLElement),
  };
  return Object.values(page).every((v) => v !== undefined) ? (page as Page) : undefined;
}

function say(el: HTMLElement, text: string): void {
  if (el.textContent !== text) el.textContent = text;
}

function download(doc: Document, name: string, text: string, type: string): void {
  const href = URL.createObjectURL(new Blob([text], { type }));
  const a = doc.createElement("a");
  a.href = href;
  a.download = name;
  a.hidden = true;
  doc.body.append(a);
  a.click();
  a.remove();
  // The browser has started reading the blob by now; a late revoke keeps slow downloads safe.
  setTimeout(() => URL.revokeObjectURL(href), 60_000);
}

async function fetchData(url: string): Promise<TryData | string> {
  try {
    const response = await fetch(url);
    if (!response.ok) return `the catalogue could not be loaded (${response.status} ${response.statusText} for ${url})`;
    return readTryData(await response.json());
  } catch (e) {
    return `the catalogue could not be loaded (${e instanceof Error ? e.message : String(e)})`;
  }
}

/** Colours the status by the design's verdict; none while nothing is evaluated. */
function setOutcome(status: HTMLElement, state: string | undefined): void {
  for (const s of ["holds", "marginal", "fails"]) status.classList.toggle(`try-${s}`, state === s);
}

/** Edits closer together than this share one simulation. */
const SIMULATION_PAUSE_MS = 150;

class TryPage {
  readonly page: Page;
  readonly doc: Document;
  readonly data: TryData;
  readonly catalogue: Catalogue;
  draft: Draft = { ...DEFAULT_DRAFT };
  result: DesignResult | undefined;
  expanded = new Set<string>();
  /** The next address change gets its own history entry (set after each committed edit). */
  pushNext = false;
  scheduled = 0;
  /** A timer writing the address after the frame an edit redrew (0: none pending), and the design it writes. */
  addressTimer = 0;
  addressDraft: Readonly<Draft> = this.draft;
  /** The visitor asked for the simulated reading: it follows every evaluation, after a pause. */
  simulating = false;
  simulationTimer = 0;
  // The link check evaluates a design once; the update that follows reuses that evaluation.
  cached: { key: string; evaluation: Evaluation } | undefined;
  /** Counts topology loads, so only the latest one's outcome is acted on. */
  loadCount = 0;

  constructor(doc: Document, page: Page, data: TryData) {
    this.doc = doc;
    this.page = page;
    this.data = data;
    this.catalogue = indexCatalogue(data.parts);
  }

  evaluate(design: Design): Evaluation {
    const key = JSON.stringify(design);
    if (this.cached?.key === key) return this.cached.evaluation;
    const evaluation = evaluateDesign(design, this.catalogue);
    this.cached = { key, evaluation };
    return evaluation;
  }

  async start(): Promise<void> {
    const { page, doc } = this;
    fillPartLists(doc, this.data.parts);
    for (const d of this.data.designs) {
      const option = doc.createElement("option");
      option.value = d.id;
      option.textContent = `${d.id}: ${d.title}`;
      page.start.append(option);
    }
    page.form.addEventListener("input", (e) => this.onInput(e));
    page.form.addEventListener("change", (e) => {
      this.onInput(e);
      // The committed value goes into the current entry before the next edit may push one.
      this.flushAddress();
      this.pushNext = true;
    });
    page.form.addEventListener("submit", (e) => e.preventDefault());
    page.load.addEventListener("click", () => this.loadDemo());
    page.results.addEventListener("click", (e) => this.onResultsClick(e));
    page.downloadDesign.addEventListener("click", () => void this.downloadDesign());
    page.downloadCsv.addEventListener("click", () => void this.downloadCsv());
    doc.getElementById("try-simulate")?.addEventListener("click", () => {
      this.simulating = true;
      this.queueSimulation(0);
    });
    window.addEventListener("popstate", () => {
      // The address now belongs to another history entry; a pending write would overwrite it.
      this.cancelAddress();
      void this.fromUrl(false);
    });
    await this.fromUrl(true);
    page.root.removeAttribute("aria-busy");
    page.form.querySelectorAll("fieldset").forEach((f) => (f.disabled = false));
  }

  /**
   * Reads the address; a repaired or replaced link is written back so address
   * and page agree. The topologies the link and the defaults name are fetched
   * first, since reading a link evaluates it.
   */
  async fromUrl(first: boolean): Promise<void> {
    const search = this.doc.location.search;
    const named = [decodeQuery(search).values["topology"], DEFAULT_DRAFT["topology"]];
    const ids = [...new Set(named.flatMap((t) => topologiesFor(t)))];
    if (!areLoaded(ids)) {
      if (!(await this.loadFor(ids))) {
        // Nothing can be evaluated without it: the form shows the design, the status says why.
        writeDraft(this.doc, this.draft);
        return;
      }
      // Another address came meanwhile (back, then back again); its own read wins.
      if (this.doc.location.search !== search) return;
    }
    const state = stateFromUrl(this.doc.location.search, DEFAULT_DRAFT, (design) => {
      const evaluation = this.evaluate(design);
      return evaluation.ok ? [] : evaluation.problems;
    });
    this.showLinkProblems(state);
    this.draft = state.draft;
    writeDraft(this.doc, this.draft);
    this.update({ writeUrl: state.problems.length > 0 ? "replace" : "none" });
    this.pushNext = true;
    if (!first) say(this.page.downloadMessage, "");
  }

  showLinkProblems(state: UrlState): void {
    const box = this.page.linkProblems;
    if (state.problems.length === 0) {
      box.hidden = true;
      box.replaceChildren();
      return;
    }
    const doc = this.doc;
    const head = doc.createElement("p");
    head.textContent =
      state.fallback === "defaults"
        ? "This link does not hold a usable design, so the page starts from the defaults. What was wrong:"
        : state.fallback === "fields"
          ? `Part of this link could not be used; ${state.replaced.length === 1 ? `${state.replaced[0]} shows its default` : `${state.replaced.length} fields show their defaults`}. What was wrong:`
          : "Part of this link was ignored:";
    const list = doc.createElement("ul");
    for (const p of state.problems) {
      const li = doc.createElement("li");
      li.textContent = formatProblem(p);
      list.append(li);
    }
    box.replaceChildren(head, list);
    box.hidden = false;
  }

  loadDemo(): void {
    this.flushAddress();
    const id = this.page.start.value;
    const demo = this.data.designs.find((d) => d.id === id);
    this.draft = demo ? draftFromInput(demo.input, DEFAULT_DRAFT) : { ...DEFAULT_DRAFT };
    writeDraft(this.doc, this.draft);
    this.page.linkProblems.hidden = true;
    this.pushNext = true;
    this.update({ writeUrl: "auto" });
    this.pushNext = true;
  }

  onInput(e: Event): void {
    const target = e.target;
    if (!(target instanceof HTMLInputElement || target instanceof HTMLSelectElement)) return;
    const field = FIELD_BY_PATH.get(target.id);
    if (!field) return;
    const text = readField(this.doc, field.path) ?? "";
    if (this.draft[field.path] === text) return;
    this.draft = { ...this.draft, [field.path]: text };
    showParsed(this.doc, field, text);
    if (field.type === "choice") showApplicable(this.doc, this.draft);
    // Several events in one frame (typing fast, a paste) cost one evaluation.
    if (this.scheduled === 0) {
      this.scheduled = requestAnimationFrame(() => {
        this.scheduled = 0;
        this.update({ writeUrl: "after-frame" });
      });
    }
  }

  onResultsClick(e: Event): void {
    const button = e.target instanceof Element ? e.target.closest<HTMLElement>("[data-toggle]") : null;
    const key = button?.dataset.toggle;
    if (key === undefined || !this.result) return;
    if (this.expanded.has(key)) this.expanded.delete(key);
    else this.expanded.add(key);
    renderTry(this.page.results, this.result, { expanded: this.expanded });
  }

  /**
   * Fetches topology modules with the results marked busy and the status
   * saying so; true once they are in. A failure is said in the status; the
   * browser remembers a module it could not fetch, so only a reload tries
   * again. Only the latest call's outcome shows.
   */
  async loadFor(ids: readonly string[]): Promise<boolean> {
    const { page } = this;
    const count = ++this.loadCount;
    const names = ids.map((id) => TOPOLOGY_META.find((t) => t.id === id)?.title ?? id);
    const what = names.length === 1 ? `the ${names[0]} topology` : `the ${names.length} topologies`;
    page.results.setAttribute("aria-busy", "true");
    page.results.classList.add("try-stale");
    say(page.status, `Loading ${what}…`);
    setOutcome(page.status, undefined);
    try {
      await loadTopologies(ids);
      return count === this.loadCount;
    } catch (e) {
      if (count !== this.loadCount) return false;
      say(
        page.status,
        `The page could not load ${what} (${e instanceof Error ? e.message : String(e)}). Reload the page to try again: the address holds the design.`,
      );
      page.downloadCsv.disabled = true;
      return false;
    } finally {
      if (count === this.loadCount) page.results.removeAttribute("aria-busy");
    }
  }

  /** Checks the draft, evaluates it, redraws, and (when valid) moves the address along. */
  update({ writeUrl }: { writeUrl: "auto" | "after-frame" | "replace" | "none" }): void {
    const wanted = topologiesFor(this.draft["topology"]);
    if (!areLoaded(wanted)) {
      void this.loadFor(wanted).then((ready) => {
        if (ready) this.update({ writeUrl });
        // The address still follows the choice, so a reload tries the same design again.
        else if (writeUrl === "after-frame") this.queueAddress();
        else if (writeUrl !== "none") this.writeUrl(writeUrl === "replace");
      });
      return;
    }
    // A load still running is for a topology no longer chosen.
    if (this.page.results.hasAttribute("aria-busy")) {
      this.loadCount++;
      this.page.results.removeAttribute("aria-busy");
    }
    const started = performance.now();
    const { page, doc } = this;
    const checked = checkDraft(this.draft);
    let problems: Problem[] = checked.problems;
    let result: DesignResult | undefined;
    if (checked.design) {
      const evaluation = this.evaluate(checked.design);
      if (evaluation.ok) result = evaluation.result;
      else problems = evaluation.problems.map((p) => ({ file: "form", path: p.path, message: p.message }));
    }
    const evaluated = performance.now();
    showProblems(doc, problems, page.formProblems);

    if (!result) {
      page.results.classList.add("try-stale");
      page.downloadDesign.disabled = checked.design === undefined;
      page.downloadCsv.disabled = true;
      const n = problems.length;
      say(
        page.status,
        `${n === 1 ? "One field needs" : `${n} fields need`} attention (marked in the form). ${this.result ? "The results below are for the last design that could be evaluated." : ""}`.trim(),
      );
      return;
    }
    this.result = result;
    renderTry(page.results, result, { expanded: this.expanded });
    page.results.classList.remove("try-stale");
    page.downloadDesign.disabled = false;
    page.downloadCsv.disabled = false;
    page.caution.hidden = !needsCaution(result.design);
    const { state, line } = holdsLine(result);
    say(page.status, `${line} ${this.catalogue.parts.length} parts checked.`);
    setOutcome(page.status, state);
    if (writeUrl === "after-frame") this.queueAddress();
    else if (writeUrl !== "none") this.writeUrl(writeUrl === "replace");
    if (this.simulating) this.queueSimulation(SIMULATION_PAUSE_MS);
    // For benchmarks and the browser tests: schema check + engine, and the DOM update, in ms.
    const done = performance.now();
    // Only the latest pair is kept, so a long session does not grow the timeline.
    performance.clearMeasures("railsieve:try-evaluate");
    performance.clearMeasures("railsieve:try-render");
    performance.measure("railsieve:try-evaluate", { start: started, end: evaluated });
    performance.measure("railsieve:try-render", { start: evaluated, end: done });
    page.root.dataset.updateMs = (done - started).toFixed(1);
  }

  /**
   * The simulation runs in a task of its own once edits pause, never in the
   * frame that answers a keystroke; its code is fetched the first time.
   */
  queueSimulation(pauseMs: number): void {
    window.clearTimeout(this.simulationTimer);
    const out = this.doc.getElementById("try-simulation");
    if (!out) return;
    this.simulationTimer = window.setTimeout(() => {
      this.simulationTimer = 0;
      const result = this.result;
      if (!result) return;
      say(out, "Simulating…");
      import("./simulation.ts")
        .then(({ simulationHtml }) => {
          // A newer edit may have replaced the result meanwhile: draw only the latest.
          if (this.result === result) out.innerHTML = simulationHtml(result, this.catalogue);
        })
        .catch((e: unknown) =>
          say(out, `The simulation could not run: ${e instanceof Error ? e.message : String(e)}.`),
        );
    }, pauseMs);
  }

  /**
   * A history write costs a few ms that a keystroke's frame cannot spare, so it
   * runs in a task after that frame; edits in between share one write.
   */
  queueAddress(): void {
    // The draft of this update, which was valid: a later edit may not be.
    this.addressDraft = this.draft;
    if (this.addressTimer === 0) this.addressTimer = window.setTimeout(() => this.flushAddress(), 0);
  }

  flushAddress(): void {
    if (this.addressTimer === 0) return;
    this.cancelAddress();
    this.writeUrl(false, this.addressDraft);
  }

  cancelAddress(): void {
    window.clearTimeout(this.addressTimer);
    this.addressTimer = 0;
  }

  writeUrl(replace: boolean, draft: Readonly<Draft> = this.draft): void {
    const query = encodeDraft(draft);
    const href = `${this.doc.location.pathname}?${query}${this.doc.location.hash}`;
    if (`?${query}` === this.doc.location.search) return;
    if (this.pushNext && !replace) history.pushState(null, "", href);
    else history.replaceState(null, "", href);
    this.pushNext = false;
  }

  /** Code only a button needs, fetched on its first press; a failed fetch is said beside the buttons. */
  async buttonCode<T>(load: () => Promise<T>): Promise<T | undefined> {
    try {
      return await load();
    } catch (e) {
      say(
        this.page.downloadMessage,
        `The page could not load the code for this button (${e instanceof Error ? e.message : String(e)}). Try again.`,
      );
      return undefined;
    }
  }

  async downloadDesign(): Promise<void> {
    if (!areLoaded(topologiesFor(this.draft["topology"]))) {
      say(this.page.downloadMessage, "The design file can be written once its topology has loaded.");
      return;
    }
    const code = await this.buttonCode(() => import("./design-file.ts"));
    if (!code) return;
    const out = code.designFileFromDraft(this.draft);
    if (!out.ok) {
      say(
        this.page.downloadMessage,
        `The design file cannot be written yet: ${out.problems.length} field${out.problems.length === 1 ? "" : "s"} need attention.`,
      );
      return;
    }
    download(this.doc, out.name, out.text, "application/json");
    say(this.page.downloadMessage, `Saved ${out.name}: put it in data/designs/ and run railsieve validate.`);
  }

  async downloadCsv(): Promise<void> {
    const result = this.result;
    if (!result) return;
    const code = await this.buttonCode(() => import("./csv-export.ts"));
    if (!code) return;
    const name = code.shortlistCsvName(result);
    download(this.doc, name, code.shortlistCsv(result), "text/csv;charset=utf-8");
    say(this.page.downloadMessage, `Saved ${name}.`);
  }
}

/** Starts the page; safe to call on a page without the try markup. */
export async function startTry(doc: Document = document): Promise<void> {
  const page = find(doc);
  if (!page) return;
  // The built pages carry their root relative to themselves (data-root), so the
  // guide works from whatever path a server puts it under.
  const root = new URL(doc.documentElement.dataset.root ?? import.meta.env.BASE_URL, doc.location.href);
  setSiteBase(root.pathname);
  const url = joinBase(root.pathname, TRY_DATA_PATH);
  const data = await fetchData(url);
  if (typeof data === "string") {
    say(page.status, `The try page cannot start: ${data}. The design pages show the demo designs without it.`);
    page.root.removeAttribute("aria-busy");
    return;
  }
  try {
    await new TryPage(doc, page, data).start();
  } catch (e) {
    // A bug must not leave a half-working page that looks fine.
    say(
      page.status,
      `The try page stopped: ${e instanceof Error ? e.message : String(e)}. Please report this with the address of the page.`,
    );
  }
}
