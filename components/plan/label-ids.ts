/** The engine names records by id in its messages; people read labels ("Gate walnut", "County road line"). */
export function withLabels(text: string, labels: ReadonlyMap<string, string>): string {
  return text.replace(/[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}/gi, (id) => labels.get(id.toLowerCase()) ?? id);
}

export function labelsOf(...lists: readonly (readonly { id: string; label?: string; name?: string }[])[]): Map<string, string> {
  const out = new Map<string, string>();
  for (const list of lists) for (const r of list) out.set(r.id.toLowerCase(), `“${r.label ?? r.name ?? r.id}”`);
  return out;
}
