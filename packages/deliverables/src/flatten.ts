// A flat (path, value) listing of a JSON value, for echoing the validated input in the workbook.
// Paths use dots for object keys and [i] for array items: `hopper.apexHalfAngle`, `columns[3].angle`.

export type FlatValue = string | number | boolean | null;

export interface FlatEntry {
  path: string;
  value: FlatValue;
}

function join(prefix: string, key: string): string {
  return prefix === '' ? key : `${prefix}.${key}`;
}

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

/**
 * Leaves in document order. Empty objects and arrays are kept as '{}' and '[]' so that the echo
 * shows they were given; values JSON cannot carry (functions, undefined) are skipped, as
 * JSON.stringify would.
 */
export function flattenJson(value: unknown, prefix = ''): FlatEntry[] {
  if (value === null || typeof value === 'string' || typeof value === 'number' || typeof value === 'boolean') {
    return [{ path: prefix, value }];
  }
  if (Array.isArray(value)) {
    if (value.length === 0) {
      return [{ path: prefix, value: '[]' }];
    }
    return value.flatMap((item, index) => flattenJson(item, `${prefix}[${index}]`));
  }
  if (isRecord(value)) {
    const keys = Object.keys(value).filter((key) => value[key] !== undefined && typeof value[key] !== 'function');
    if (keys.length === 0) {
      return [{ path: prefix, value: '{}' }];
    }
    return keys.flatMap((key) => flattenJson(value[key], join(prefix, key)));
  }
  return [];
}
