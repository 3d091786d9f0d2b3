/** A zod-style path (['primitives', 1, 'radius']) written as the API names fields: `primitives[1].radius`. */
export function formatJsonPath(path: readonly PropertyKey[]): string {
  let s = '';
  for (const k of path) {
    if (typeof k === 'number') s += `[${k}]`;
    else s += s ? `.${String(k)}` : String(k);
  }
  return s;
}
