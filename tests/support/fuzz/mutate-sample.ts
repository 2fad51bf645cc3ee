import fc from 'fast-check';
import { hostileValue } from './hostile-values';

type Path = (string | number)[];

/** Every place in a JSON value where a leaf or a member could be changed. */
function placesIn(value: unknown, path: Path = []): Path[] {
  const places: Path[] = [path];
  if (Array.isArray(value))
    value.forEach((item, i) => places.push(...placesIn(item, [...path, i])));
  else if (value && typeof value === 'object')
    for (const [key, item] of Object.entries(value)) places.push(...placesIn(item, [...path, key]));
  return places;
}

function replaceAt(value: unknown, path: Path, by: unknown, remove: boolean): unknown {
  if (path.length === 0) return by;
  const [head, ...rest] = path;
  if (Array.isArray(value)) {
    const copy: unknown[] = [...(value as unknown[])];
    const index = head as number;
    if (rest.length === 0 && remove) copy.splice(index, 1);
    else copy[index] = replaceAt(copy[index], rest, by, remove);
    return copy;
  }
  const copy = { ...(value as Record<string, unknown>) };
  const key = String(head);
  if (rest.length === 0 && remove) delete copy[key];
  else copy[key] = replaceAt(copy[key], rest, by, remove);
  return copy;
}

/** A near-valid body: the sample with one place replaced by a hostile value, or removed. */
export function mutatedSample(sample: unknown): fc.Arbitrary<unknown> {
  const places = placesIn(sample);
  return fc
    .tuple(fc.constantFrom(...places), hostileValue, fc.boolean())
    .map(([path, by, remove]) => replaceAt(sample, path, by, remove && path.length > 0));
}
