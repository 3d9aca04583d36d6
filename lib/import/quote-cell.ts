// Cell text as shown in messages: in double quotes, cut after 40 characters so a runaway cell cannot flood a report.

const MAX_SHOWN = 40;

export function quoteCell(text: string): string {
  return `"${text.length > MAX_SHOWN ? `${text.slice(0, MAX_SHOWN)}…` : text}"`;
}
