import { paramError } from './errors.js';

/**
 * Form parameters as the urlencoded parser hands them over: every leaf is a
 * string, nested objects come from bracketed keys. These helpers read one
 * field, coerce it (numbers and booleans arrive as text) and name the full
 * bracketed parameter in the error when it is wrong.
 */
export type Params = Record<string, unknown>;

function required<T>(value: T | undefined, path: string): T {
  if (value === undefined) throw paramError(`Missing required param: ${path}.`, path, 'parameter_missing');
  return value;
}

function isPlainObject(value: unknown): value is Params {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

export function joinParam(parent: string, child: string | number): string {
  return parent ? `${parent}[${child}]` : String(child);
}

/** A nested hash such as `product_data`; an absent field gives `undefined`. */
export function readHash(params: Params, name: string, path = name): Params | undefined {
  const value = params[name];
  if (value === undefined) return undefined;
  if (!isPlainObject(value)) throw paramError(`Invalid object for ${path}: expected a hash.`, path);
  return value;
}

export function requireHash(params: Params, name: string, path = name): Params {
  return required(readHash(params, name, path), path);
}

/**
 * An array parameter. Indexed keys (`items[0]`, `items[1]`) arrive as an
 * array; the parser gives an object with numeric keys when indexes are sparse
 * or very large, which is accepted too, in index order.
 */
export function readArray(params: Params, name: string, path = name): unknown[] | undefined {
  const value = params[name];
  if (value === undefined) return undefined;
  if (Array.isArray(value)) return value;
  if (isPlainObject(value) && Object.keys(value).every((k) => /^\d+$/.test(k))) {
    return Object.keys(value)
      .sort((a, b) => Number(a) - Number(b))
      .map((k) => value[k]);
  }
  if (typeof value === 'string') return [value];
  throw paramError(`Invalid array for ${path}.`, path);
}

interface StringOptions {
  maxLength?: number;
  allowEmpty?: boolean;
}

export function readString(params: Params, name: string, path = name, opts: StringOptions = {}): string | undefined {
  const value = params[name];
  if (value === undefined) return undefined;
  if (typeof value !== 'string') throw paramError(`Invalid string for ${path}: expected text.`, path);
  if (!opts.allowEmpty && value === '') {
    throw paramError(`You passed an empty string for '${path}'. Leave the parameter out instead.`, path);
  }
  if (opts.maxLength !== undefined && value.length > opts.maxLength) {
    throw paramError(`Invalid ${path}: must be at most ${opts.maxLength} characters long.`, path);
  }
  return value;
}

export function requireString(params: Params, name: string, path = name, opts: StringOptions = {}): string {
  return required(readString(params, name, path, opts), path);
}

interface IntegerOptions {
  min?: number;
  max?: number;
}

export function readInteger(params: Params, name: string, path = name, opts: IntegerOptions = {}): number | undefined {
  const value = params[name];
  if (value === undefined) return undefined;
  const text = typeof value === 'number' ? String(value) : value;
  if (typeof text !== 'string' || !/^-?\d+$/.test(text.trim())) {
    throw paramError(`Invalid integer: ${typeof value === 'string' ? value : JSON.stringify(value)}`, path);
  }
  const number = Number(text.trim());
  if (!Number.isSafeInteger(number)) throw paramError(`Invalid integer: ${text}`, path);
  if (opts.min !== undefined && number < opts.min) {
    throw paramError(`Invalid ${path}: must be greater than or equal to ${opts.min}.`, path);
  }
  if (opts.max !== undefined && number > opts.max) {
    throw paramError(`Invalid ${path}: must be less than or equal to ${opts.max}.`, path);
  }
  return number;
}

export function requireInteger(params: Params, name: string, path = name, opts: IntegerOptions = {}): number {
  return required(readInteger(params, name, path, opts), path);
}

export function readBoolean(params: Params, name: string, path = name): boolean | undefined {
  const value = params[name];
  if (value === undefined) return undefined;
  if (value === true || value === 'true') return true;
  if (value === false || value === 'false') return false;
  throw paramError(`Invalid boolean: ${String(value)}`, path);
}

export function readEnum<T extends string>(
  params: Params,
  name: string,
  allowed: readonly T[],
  path = name,
): T | undefined {
  const value = readString(params, name, path);
  if (value === undefined) return undefined;
  if (!(allowed as readonly string[]).includes(value)) {
    throw paramError(`Invalid ${path}: must be one of ${allowed.join(', ')}`, path);
  }
  return value as T;
}

/** Rejects parameters the endpoint does not know, as the service does. */
export function rejectUnknown(params: Params, allowed: readonly string[], parent = ''): void {
  for (const key of Object.keys(params)) {
    if (!allowed.includes(key)) {
      throw paramError(`Received unknown parameter: ${joinParam(parent, key)}`, joinParam(parent, key), 'parameter_unknown');
    }
  }
}

const METADATA_MAX_KEYS = 50;
const METADATA_MAX_KEY_LENGTH = 40;
const METADATA_MAX_VALUE_LENGTH = 500;

/**
 * `metadata[key]=value` pairs. An empty string value unsets a key; an empty
 * `metadata=` clears everything. Limits: 50 keys, keys up to 40 characters,
 * values up to 500 characters.
 */
export function readMetadata(params: Params, name = 'metadata', path = name): Record<string, string> | undefined {
  const value = params[name];
  if (value === undefined) return undefined;
  if (value === '') return {};
  if (!isPlainObject(value)) throw paramError(`Invalid ${path}: expected a hash of key-value pairs.`, path);
  const out: Record<string, string> = {};
  for (const [key, raw] of Object.entries(value)) {
    const keyPath = joinParam(path, key);
    if (typeof raw !== 'string') throw paramError(`Invalid ${keyPath}: metadata values must be strings.`, keyPath);
    if (key.length > METADATA_MAX_KEY_LENGTH) {
      throw paramError(`Invalid ${path}: keys can be at most ${METADATA_MAX_KEY_LENGTH} characters long.`, keyPath);
    }
    if (raw.length > METADATA_MAX_VALUE_LENGTH) {
      throw paramError(`Invalid ${keyPath}: values can be at most ${METADATA_MAX_VALUE_LENGTH} characters long.`, keyPath);
    }
    if (raw !== '') out[key] = raw;
  }
  if (Object.keys(out).length > METADATA_MAX_KEYS) {
    throw paramError(`Invalid ${path}: at most ${METADATA_MAX_KEYS} keys are allowed.`, path);
  }
  return out;
}

/** `expand[0]=payment_intent&expand[1]=…` as a list of dotted paths. */
export function readExpand(params: Params): string[] {
  const list = readArray(params, 'expand') ?? [];
  return list.map((item, i) => {
    if (typeof item !== 'string' || item === '') throw paramError('Invalid expand: expected property paths.', `expand[${i}]`);
    return item;
  });
}

export interface Range {
  gt?: number;
  gte?: number;
  lt?: number;
  lte?: number;
}

/** A timestamp filter: either `created=1700000000` or `created[gte]=…&created[lt]=…`. */
export function readRange(params: Params, name: string): Range | undefined {
  const value = params[name];
  if (value === undefined) return undefined;
  if (!isPlainObject(value)) {
    const exact = readInteger(params, name);
    return exact === undefined ? undefined : { gte: exact, lte: exact };
  }
  rejectUnknown(value, ['gt', 'gte', 'lt', 'lte'], name);
  const range: Range = {};
  for (const bound of ['gt', 'gte', 'lt', 'lte'] as const) {
    const n = readInteger(value, bound, joinParam(name, bound));
    if (n !== undefined) range[bound] = n;
  }
  return range;
}

export function inRange(value: number, range: Range | undefined): boolean {
  if (!range) return true;
  if (range.gt !== undefined && !(value > range.gt)) return false;
  if (range.gte !== undefined && !(value >= range.gte)) return false;
  if (range.lt !== undefined && !(value < range.lt)) return false;
  if (range.lte !== undefined && !(value <= range.lte)) return false;
  return true;
}
