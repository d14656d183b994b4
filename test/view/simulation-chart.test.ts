import { describe, expect, it } from "vitest";
import { renderSimulationFigure, type SimulationPicture } from "../../src/view/simulation-chart.ts";

function picture(over: Partial<SimulationPicture> = {}): SimulationPicture {
  const n = 1000;
  const time = Float64Array.from({ length: n }, (_, i) => (i / (n - 1)) * 5e-3);
  const input = time.map((t) => 10 * Math.sin(2 * Math.PI * 200 * t));
  const error = time.map((_, i) => (i === 500 ? 0.08 : 0.01 * Math.sin(i)));
  const reading = input.map((v, i) => v + (error[i] ?? 0));
  return {
    id: "sim-demo-fast",
    caption: "at 200 Hz",
    time,
    input,
    reading,
    error,
    max_error_v: 0.08,
    max_error_at_s: time[500] ?? 0,
    rms_error_v: 0.0075,
    worst_case_v: 0.09,
    required_v: 0.1,
    ...over,
  };
}

describe("renderSimulationFigure", () => {
  it("is an image with a title and a description that state the numbers", () => {
    const html = renderSimulationFigure(picture());
    expect(html).toMatch(
      /<svg class="sim-chart"[^>]*role="img" aria-labelledby="sim-demo-fast-title sim-demo-fast-desc"/,
    );
    expect(html).toContain(
      '<desc id="sim-demo-fast-desc">One period at 200 Hz: the reading follows the input; its error peaks at 80.0 mV',
    );
    expect(html).toContain("inside the static worst case of 90.0 mV");
  });

  it("says when the simulation goes beyond the static worst case, and marks the trace", () => {
    const html = renderSimulationFigure(picture({ max_error_v: 0.12 }));
    expect(html).toContain("beyond the static worst case of 90.0 mV");
    expect(html).toContain('class="sim-error sim-error-over"');
  });

  it("keeps each trace to at most two points per unit of width, spikes included", () => {
    const html = renderSimulationFigure(picture());
    const points = /<polyline class="sim-error[^"]*" points="([^"]*)"/.exec(html)?.[1]?.split(" ") ?? [];
    expect(points.length).toBeLessThanOrEqual(2 * 340);
    // The 80 mV spike survives the thinning. The error panel starts at y = 148, its
    // centre at 203, and ±0.11 V (1.1 × the largest band) spans ±53: 0.08 V sits at 164.5.
    const ys = points.map((p) => Number(p.split(",")[1]));
    expect(Math.min(...ys)).toBe(164.5);
  });

  it("has a table of the same numbers with the largest error's row marked", () => {
    const html = renderSimulationFigure(picture());
    expect(html).toContain('<th scope="col">error</th>');
    expect((html.match(/<tr/g) ?? []).length).toBe(1 + 17);
    expect(html).toContain('<tr class="sim-worst-row"><td>2.503 ms</td>');
  });

  it("escapes text it is given", () => {
    const html = renderSimulationFigure(picture({ caption: "<script>x</script>", id: 'a"b' }));
    expect(html).not.toContain("<script>");
    expect(html).toContain("&lt;script&gt;");
    expect(html).not.toContain('a"b');
  });
});
