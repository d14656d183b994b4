// The try page's data, written once per build: every catalogue part (checked
// and cleaned, in the CSV's units) and the demo designs as their files hold
// them, so a visitor who starts from one sees "4.7u" where the file says so.
import { resolve } from "node:path";
import type { APIRoute } from "astro";
import { readText } from "../../node/load-data.ts";
import { siteData } from "../../node/site-data.ts";
import type { DemoDesign, TryData } from "../../client/try/try-data.ts";

export const prerender = true;

function demoDesigns(): DemoDesign[] {
  return siteData().designs.map((entry) => {
    const { text } = readText(resolve(entry.file));
    let input: unknown = entry.design;
    try {
      if (text !== undefined) input = JSON.parse(text.startsWith("\uFEFF") ? text.slice(1) : text);
    } catch {
      // Already validated by the build; the cleaned design is a faithful stand-in.
    }
    return { id: entry.id, title: entry.design.title, input };
  });
}

export const GET: APIRoute = () => {
  const data: TryData = { parts: siteData().catalogue.parts, designs: demoDesigns() };
  return new Response(JSON.stringify(data), { headers: { "Content-Type": "application/json; charset=utf-8" } });
};
