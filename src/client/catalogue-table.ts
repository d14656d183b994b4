// Catalogue pages' behaviour (the index and each kind's page): sort buttons in
// every column header, filters by kind, status and tag, and fuzzy search as you
// type. The tables are complete without it; this script only hides and
// reorders rows. The filter state is kept in the address (?q=…&kind=…) so a
// filtered view can be shared. A row's search words are read from its cells
// (src/components/CatalogueTable.astro keeps the markup lean), its notes from
// the row.
import { cellSortKey, orderRows, type SortDirection } from "../view/catalogue-order.ts";
import { buildSearchIndex, type SearchDoc } from "../view/search-index.ts";

type Row = { el: HTMLTableRowElement; position: number; doc: SearchDoc; status: string };
type Table = {
  el: HTMLTableElement;
  body: HTMLTableSectionElement;
  section: HTMLElement;
  rows: Row[];
  /** Each column's key (th data-column), by position. */
  columns: string[];
  sort?: { column: number; direction: SortDirection };
};

function field(form: HTMLFormElement, name: string): HTMLInputElement | HTMLSelectElement {
  const el = form.elements.namedItem(name);
  if (!(el instanceof HTMLInputElement || el instanceof HTMLSelectElement))
    throw new Error(`catalogue form has no field ${name}`);
  return el;
}

/** A field the form may leave out (a kind's page has no kind choice): an empty stand-in. */
function optionalField(form: HTMLFormElement, name: string): HTMLInputElement | HTMLSelectElement {
  return form.elements.namedItem(name) === null
    ? Object.assign(document.createElement("select"), { value: "" })
    : field(form, name);
}

const rated = (cell: HTMLTableCellElement | undefined) => cell !== undefined && !cell.classList.contains("nr");
const textOf = (cell: HTMLTableCellElement | undefined) => (rated(cell) ? (cell?.textContent ?? "").trim() : "");

function setup(): void {
  const form = document.getElementById("catalogue-filters");
  const status = document.getElementById("catalogue-status-line");
  if (!(form instanceof HTMLFormElement) || !status) return;
  const q = field(form, "q");
  const kind = optionalField(form, "kind");
  const partStatus = field(form, "status");
  const tag = field(form, "tag");

  let position = 0;
  const tables: Table[] = [...document.querySelectorAll<HTMLTableElement>("table.catalogue-table")].map((el) => {
    const body = el.tBodies[0];
    const section = el.closest("section");
    if (!body || !section) throw new Error("catalogue table without body or section");
    const columns = [...(el.tHead?.rows[0]?.cells ?? [])].map((th) => th.dataset.column ?? "");
    const at = (tr: HTMLTableRowElement, key: string) => tr.cells[columns.indexOf(key)];
    const rows = [...body.rows].map((tr) => {
      const status = textOf(at(tr, "status"));
      const tags = tr.dataset.tags?.split(";") ?? textOf(at(tr, "tags")).split(", ");
      return {
        el: tr,
        position: position++,
        status,
        doc: {
          id: textOf(at(tr, "id")),
          kind: el.dataset.kind ?? "",
          name: textOf(at(tr, "name")),
          tags: tags.filter((t) => t !== ""),
          notes: tr.dataset.notes ?? "",
          status,
        },
      };
    });
    return { el, body, section, rows, columns };
  });
  const all = tables.flatMap((t) => t.rows);
  const index = buildSearchIndex(all.map((r) => r.doc));

  for (const table of tables) {
    const headers = [...(table.el.tHead?.rows[0]?.cells ?? [])];
    headers.forEach((th, column) => {
      const button = document.createElement("button");
      button.type = "button";
      button.className = "sort";
      button.textContent = th.textContent?.trim() ?? "";
      th.replaceChildren(button);
      button.addEventListener("click", () => {
        const direction: SortDirection =
          table.sort?.column === column && table.sort.direction === "ascending" ? "descending" : "ascending";
        table.sort = { column, direction };
        headers.forEach((h, i) =>
          i === column ? h.setAttribute("aria-sort", direction) : h.removeAttribute("aria-sort"),
        );
        apply(false);
      });
    });
  }

  const total = all.length;
  const apply = (updateAddress = true): void => {
    const query = q.value.trim();
    const hits = query === "" ? undefined : new Map(index.search(query).map((h) => [h.id, h.score]));
    let shown = 0;
    for (const table of tables) {
      const kindHidden = kind.value !== "" && table.el.dataset.kind !== kind.value;
      table.section.hidden = kindHidden;
      let visible = 0;
      for (const row of table.rows) {
        const match =
          !kindHidden &&
          (hits === undefined || hits.has(row.doc.id)) &&
          (partStatus.value === "" || row.status === partStatus.value) &&
          (tag.value === "" || row.doc.tags.includes(tag.value));
        row.el.hidden = !match;
        if (match) visible++;
      }
      if (!kindHidden) shown += visible;
      const none = table.section.querySelector<HTMLElement>(".none");
      if (none) none.hidden = visible > 0 || kindHidden;
      table.el.hidden = visible === 0;
      const sort = table.sort;
      // Each row's key read once per ordering, not once per comparison.
      const keys = new Map(
        sort
          ? table.rows.map((r) => {
              const cell = r.el.cells[sort.column];
              const text = cell?.textContent ?? "";
              const key = cellSortKey(
                { sort: cell?.dataset.sort, text, rated: rated(cell) },
                table.columns[sort.column] ?? "",
              );
              return [r, key] as const;
            })
          : [],
      );
      const ordered = orderRows({
        items: table.rows,
        position: (r) => r.position,
        ...(sort ? { key: (r: Row) => keys.get(r) ?? null, direction: sort.direction } : {}),
        ...(hits ? { score: (r: Row) => hits.get(r.doc.id) } : {}),
      });
      table.body.append(...ordered.map((r) => r.el));
    }
    const filtered = query !== "" || kind.value !== "" || partStatus.value !== "" || tag.value !== "";
    status.textContent = filtered
      ? `Showing ${shown} of ${total} classes${query !== "" ? ` matching “${query}”` : ""}${shown > 0 && query !== "" && tables.every((t) => !t.sort) ? ", best matches first" : ""}.`
      : `Showing all ${total} classes.`;
    if (updateAddress) {
      const params = new URLSearchParams();
      for (const [name, value] of [
        ["q", query],
        ["kind", kind.value],
        ["status", partStatus.value],
        ["tag", tag.value],
      ] as const) {
        if (value !== "") params.set(name, value);
      }
      const search = params.toString();
      history.replaceState(null, "", `${location.pathname}${search ? `?${search}` : ""}${location.hash}`);
    }
  };

  // Start from the address, so a shared link opens the same view.
  const params = new URLSearchParams(location.search);
  q.value = params.get("q") ?? "";
  for (const [el, name] of [
    [kind, "kind"],
    [partStatus, "status"],
    [tag, "tag"],
  ] as const) {
    const value = params.get(name) ?? "";
    if ([...(el as HTMLSelectElement).options].some((o) => o.value === value)) el.value = value;
  }

  form.addEventListener("submit", (e) => e.preventDefault());
  form.addEventListener("input", () => apply());
  form.addEventListener("change", (e) => e.target !== q && apply()); // the search box already applied on input; re-sorting on its blur would swallow the click on a result
  form.addEventListener("reset", () => setTimeout(() => apply(), 0));
  form.hidden = false;
  apply(false);
}

setup();
