// Puts one evaluation on the page. Each block (a role, the budget …) lives in
// its own slot and is rewritten only when its HTML changed, so an edit that
// moves one role's numbers does not re-lay-out the others. HTML comes from
// render-results.ts, where every piece of text is escaped. Exported for
// benchmarks, which time renderTry(container, result) on a large catalogue.
import type { DesignResult } from "../../core/engine/result.ts";
import { renderBlocks, type ViewState } from "./render-results.ts";

const NOTHING_EXPANDED: ViewState = { expanded: new Set() };

// What each slot holds, so unchanged blocks are left alone.
const shown = new WeakMap<HTMLElement, string>();

export function renderTry(container: HTMLElement, result: DesignResult, view: ViewState = NOTHING_EXPANDED): void {
  const doc = container.ownerDocument;
  // A "show all" button is replaced by its re-drawn self; keyboard focus follows it.
  const active = doc.activeElement;
  const toggle = active instanceof HTMLElement && container.contains(active) ? active.dataset.toggle : undefined;

  const blocks = renderBlocks(result, view);
  const slots = [...container.children].filter(
    (c): c is HTMLElement => c instanceof HTMLElement && c.dataset.slot !== undefined,
  );
  const same = slots.length === blocks.length && slots.every((s, i) => s.dataset.slot === blocks[i]?.key);
  if (!same) {
    // The set of blocks changed (another topology, a role added): start over.
    container.replaceChildren(
      ...blocks.map((b) => {
        const slot = doc.createElement("div");
        slot.dataset.slot = b.key;
        return slot;
      }),
    );
  }
  blocks.forEach((block, i) => {
    const slot = container.children[i] as HTMLElement;
    if (shown.get(slot) === block.html) return;
    slot.innerHTML = block.html;
    slot.hidden = block.html === "";
    shown.set(slot, block.html);
  });

  if (toggle !== undefined) {
    for (const button of container.querySelectorAll<HTMLElement>("[data-toggle]")) {
      if (button.dataset.toggle === toggle) {
        if (button !== doc.activeElement) button.focus();
        break;
      }
    }
  }
}
