/**
 * Reading and writing one value deep inside the survey without mutating it. Clearing a value
 * removes its key, and a group or list left empty is removed too, so a cleared reading is "not measured",
 * never an empty object the format would refuse.
 */
export type SurveyPath = readonly (string | number)[];

export function getAt(root: unknown, path: SurveyPath): unknown {
  let node = root;
  for (const key of path) {
    if (node === null || typeof node !== 'object') return undefined;
    node = (node as Record<string | number, unknown>)[key];
  }
  return node;
}

function isEmptyGroup(value: unknown) {
  return value !== null && typeof value === 'object' && Object.keys(value).length === 0;
}

export function setAt<T>(root: T, path: SurveyPath, value: unknown): T {
  if (path.length === 0) return value as T;
  const [key, ...rest] = path as [string | number, ...(string | number)[]];
  const node = (root ?? (typeof key === 'number' ? [] : {})) as Record<string | number, unknown> | unknown[];
  const child = setAt((node as Record<string | number, unknown>)[key], rest, value);
  const remove = child === undefined || isEmptyGroup(child);
  if (Array.isArray(node)) {
    const copy = [...node];
    if (remove) copy.splice(Number(key), 1);
    else copy[Number(key)] = child;
    return copy as T;
  }
  const copy = { ...(node as Record<string, unknown>) };
  if (remove) delete copy[key];
  else copy[key] = child;
  return copy as T;
}
