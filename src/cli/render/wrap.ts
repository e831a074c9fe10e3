/** Word-wrapping for the readable outputs. */

/** Break a line at spaces so it fits `width` columns; continuation lines get `indent`. */
export function wrap(text: string, width: number, indent: string): string[] {
  const lead = /^\s*/.exec(text)![0];
  const words = text.slice(lead.length).split(" ");
  const out: string[] = [];
  let line = lead;
  for (const w of words) {
    if (line.trim().length > 0 && line.length + 1 + w.length > width) {
      out.push(line);
      line = indent + w;
    } else line = line.trim().length > 0 ? `${line} ${w}` : line + w;
  }
  if (line.length > 0) out.push(line);
  return out;
}
