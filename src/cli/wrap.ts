// Word-wrapping for 80-column terminals.
export function wrap(text: string, width: number, indent: string, firstIndent = indent): string {
  const words = text.split(/\s+/).filter((w) => w !== "");
  const lines: string[] = [];
  let line = firstIndent;
  let empty = true;
  for (const word of words) {
    if (!empty && line.length + 1 + word.length > width) {
      lines.push(line);
      line = indent + word;
    } else {
      line += (empty ? "" : " ") + word;
    }
    empty = false;
  }
  lines.push(line);
  return lines.join("\n");
}
