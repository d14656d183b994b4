// The form's boxes ↔ the draft, and the inline messages beside each box. The
// markup comes from the page (built from fields.ts); this only reads and
// writes values, shows or hides the fields a design does not use, and fills
// the BOM lists once the catalogue has arrived. Text goes in via textContent.
import type { Part } from "../../core/catalogue.ts";
import type { Problem } from "../../core/problems.ts";
import { parseSI, formatSI, formatPercent } from "../../core/units.ts";
import { kindsThatCan, kindWords } from "../../core/kinds.ts";
import { ROLE_META } from "../../topologies/meta.ts";
import { applies, FIELDS, messageId, parsedId, type Draft, type Field } from "./fields.ts";

type Box = HTMLInputElement | HTMLSelectElement;

function box(doc: Document, path: string): Box | null {
  const el = doc.getElementById(path);
  return el instanceof HTMLInputElement || el instanceof HTMLSelectElement ? el : null;
}

/** Sets every box from a draft and shows only the fields the design uses. */
export function writeDraft(doc: Document, draft: Readonly<Draft>): void {
  for (const f of FIELDS) {
    const el = box(doc, f.path);
    if (!el) continue;
    const text = draft[f.path] ?? "";
    if (el instanceof HTMLSelectElement) ensureOption(el, text);
    if (el.value !== text) el.value = text;
    showParsed(doc, f, text);
  }
  showApplicable(doc, draft);
}

// A link may name a BOM part this catalogue lacks; the engine then says so
// beside the box, which must still show what the link asked for.
function ensureOption(select: HTMLSelectElement, value: string): void {
  if (value === "" || [...select.options].some((o) => o.value === value)) return;
  const option = select.ownerDocument.createElement("option");
  option.value = value;
  option.textContent = `${value} (not in the catalogue)`;
  select.append(option);
}

export function readField(doc: Document, path: string): string | undefined {
  return box(doc, path)?.value;
}

export function showApplicable(doc: Document, draft: Readonly<Draft>): void {
  for (const f of FIELDS) {
    if (f.when === undefined) continue;
    const wrap = doc.querySelector<HTMLElement>(`[data-field="${f.path}"]`);
    const el = box(doc, f.path);
    const on = applies(f, draft);
    if (wrap) wrap.hidden = !on;
    if (el) el.disabled = !on;
  }
}

/** What a number box was understood as ("4.7u" → "= 4.70 µF"), so a prefix slip shows at once. */
export function showParsed(doc: Document, field: Field, text: string): void {
  if (field.type !== "number") return;
  const out = doc.getElementById(parsedId(field.path));
  if (!out) return;
  const parsed = text.trim() === "" ? undefined : parseSI(text);
  let shown = "";
  // A plain "5" needs no echo; "4.7u", "2e3" and fractions (shown as a percentage) do.
  if (parsed?.ok) {
    if (field.unit === "fraction") shown = `= ${formatPercent(parsed.value)}`;
    else if (field.style === "si" && /[^\d.+-]/.test(text.trim())) shown = `= ${formatSI(parsed.value, field.unit)}`;
  }
  if (out.textContent !== shown) out.textContent = shown;
}

/** Form-wide lists (one per form) whose form shows no problem right now. */
const clearForms = new WeakSet<HTMLElement>();

/**
 * Shows each problem beside the field its JSON path names; problems that name
 * no field (or a hidden one) go to the form-wide list. Returns how many.
 */
export function showProblems(doc: Document, problems: readonly Problem[], formList: HTMLElement): number {
  // Most edits leave a valid form valid; then there is nothing to clear, and every field need not be visited.
  if (problems.length === 0 && clearForms.has(formList)) return 0;
  const byField = new Map<string, string[]>();
  const loose: string[] = [];
  for (const p of problems) {
    const path = p.path ?? "";
    const field =
      FIELDS.find((f) => f.path === path) ?? FIELDS.find((f) => path !== "" && f.path.startsWith(`${path}.`));
    const el = field ? box(doc, field.path) : null;
    if (field && el && !el.disabled) byField.set(field.path, [...(byField.get(field.path) ?? []), p.message]);
    else loose.push(path === "" ? p.message : `${path}: ${p.message}`);
  }
  for (const f of FIELDS) {
    const el = box(doc, f.path);
    const msg = doc.getElementById(messageId(f.path));
    const messages = byField.get(f.path);
    const text = messages ? messages.join(" ") : "";
    if (msg && msg.textContent !== text) msg.textContent = text;
    if (el) {
      if (messages) el.setAttribute("aria-invalid", "true");
      else el.removeAttribute("aria-invalid");
    }
  }
  formList.replaceChildren(
    ...loose.map((text) => {
      const li = doc.createElement("li");
      li.textContent = text;
      return li;
    }),
  );
  formList.hidden = loose.length === 0;
  if (problems.length === 0) clearForms.add(formList);
  else clearForms.delete(formList);
  return problems.length;
}

/** Fills each BOM list with the parts of the kinds its role takes, grouped by kind. */
export function fillPartLists(doc: Document, parts: readonly Part[]): void {
  for (const f of FIELDS) {
    if (f.type !== "part") continue;
    const select = box(doc, f.path);
    const role = ROLE_META.find((r) => r.id === f.role);
    if (!(select instanceof HTMLSelectElement) || !role) continue;
    const groups = kindsThatCan(role.wants).map((kind) => {
      const group = doc.createElement("optgroup");
      group.label = kindWords(kind).heading;
      for (const p of parts) {
        if (p.kind !== kind) continue;
        const option = doc.createElement("option");
        option.value = p.id;
        option.textContent = `${p.id}: ${p.name}`;
        group.append(option);
      }
      return group;
    });
    select.append(...groups.filter((g) => g.children.length > 0));
  }
}
