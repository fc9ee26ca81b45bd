// Stripe's request encoding: application/x-www-form-urlencoded with bracketed keys
// (`line_items[0][price]=…&metadata[firm_id]=…`), the same on the query string of GETs. The
// stand-in turns it back into the nested object the SDK started from; values stay strings.

export type FormValue = string | FormValue[] | { [key: string]: FormValue };
export type FormObject = { [key: string]: FormValue };

/** `a[b][0][c]` → ["a", "b", "0", "c"]. */
function keyPath(key: string): string[] {
  const head = key.split("[", 1)[0]!;
  const rest = [...key.slice(head.length).matchAll(/\[([^\]]*)\]/g)].map((m) => m[1]!);
  return [head, ...rest];
}

/** Nested object from form pairs; objects whose keys are all indices become arrays. */
export function parseForm(text: string): FormObject {
  const root: FormObject = {};
  for (const [key, value] of new URLSearchParams(text)) {
    const path = keyPath(key);
    let node: { [key: string]: FormValue } = root;
    path.forEach((part, i) => {
      if (i === path.length - 1) node[part] = value;
      else node = (node[part] ??= {}) as { [key: string]: FormValue };
    });
  }
  return arrayify(root) as FormObject;
}

function arrayify(value: FormValue): FormValue {
  if (typeof value === "string" || Array.isArray(value)) return value;
  const keys = Object.keys(value);
  const entries = Object.fromEntries(keys.map((k) => [k, arrayify(value[k]!)]));
  if (keys.length > 0 && keys.every((k) => /^\d+$/.test(k))) {
    return keys.sort((a, b) => Number(a) - Number(b)).map((k) => entries[k]!);
  }
  return entries;
}
