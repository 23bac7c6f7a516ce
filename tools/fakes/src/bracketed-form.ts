export type FormValue = string | FormValue[] | FormObject;
export type FormObject = { [key: string]: FormValue };

export class FormSyntaxError extends Error {
  constructor(readonly param: string) {
    super(`Invalid parameter: ${param}`);
  }
}

const KEY = /^([^[\]]+)((?:\[[^[\]]*\])*)$/;
const FORBIDDEN = new Set(['__proto__', 'constructor', 'prototype']);

/**
 * Reads the processor's form encoding (`metadata[branchId]=b1&expand[0]=data.charge&created[gte]=1700000000`)
 * into nested objects; objects keyed 0..n-1 (or built with `[]`) become arrays.
 */
export function parseBracketedForm(text: string): FormObject {
  const root: FormObject = Object.create(null) as FormObject;
  for (const [rawKey, value] of new URLSearchParams(text)) {
    const match = KEY.exec(rawKey);
    if (!match) throw new FormSyntaxError(rawKey);
    const path = [match[1]!, ...[...match[2]!.matchAll(/\[([^[\]]*)\]/g)].map((m) => m[1]!)];
    if (path.some((segment) => FORBIDDEN.has(segment))) throw new FormSyntaxError(rawKey);
    let node = root;
    for (let i = 0; i < path.length - 1; i++) {
      const segment = path[i]!;
      const next = node[segment];
      if (next === undefined) node = node[segment] = Object.create(null) as FormObject;
      else if (typeof next === 'object' && !Array.isArray(next)) node = next;
      else throw new FormSyntaxError(rawKey);
    }
    let leaf = path[path.length - 1]!;
    if (leaf === '') leaf = String(Object.keys(node).length);
    if (node[leaf] !== undefined) throw new FormSyntaxError(rawKey);
    node[leaf] = value;
  }
  return toArrays(root) as FormObject;
}

function toArrays(value: FormValue): FormValue {
  if (typeof value === 'string' || Array.isArray(value)) return value;
  const keys = Object.keys(value);
  for (const key of keys) value[key] = toArrays(value[key]!);
  const indexed = keys.length > 0 && keys.every((key, i) => key === String(i));
  return indexed ? keys.map((key) => value[key]!) : value;
}
