// Input paths of a spec document: `support.columns`, `equipment[0].force`. Shared by the spec-sheet
// reader and the options file.

/** Set (or, with null, remove) the input at a dotted path of a spec document, creating tables on the way. */
export function setInputPath(document: Record<string, unknown>, path: string, value: unknown): void {
  const parts = path.split('.').flatMap((part) => {
    const match = /^([A-Za-z][A-Za-z0-9]*)\[(\d+)\]$/.exec(part);
    return match ? [match[1] as string, Number(match[2])] : [part];
  });
  let node: Record<string, unknown> | unknown[] = document;
  for (let i = 0; i < parts.length - 1; i++) {
    const key = parts[i] as string | number;
    const nextKey = parts[i + 1];
    const current: unknown = (node as Record<string | number, unknown>)[key];
    if (typeof current === 'object' && current !== null) {
      node = current as Record<string, unknown> | unknown[];
      continue;
    }
    if (value === null) return;
    const created: Record<string, unknown> | unknown[] = typeof nextKey === 'number' ? [] : {};
    (node as Record<string | number, unknown>)[key] = created;
    node = created;
  }
  const last = parts[parts.length - 1] as string | number;
  if (value === null) {
    if (Array.isArray(node) && typeof last === 'number') node.splice(last, 1);
    else delete (node as Record<string, unknown>)[last as string];
  } else {
    (node as Record<string | number, unknown>)[last] = structuredClone(value);
  }
}
