import { invalidRequest } from './errors';
import type { Metadata } from './types';

/** Parameters as parsed from a form body or query string by `qs` (strings, arrays, nested objects). */
export type RawParams = Record<string, unknown>;

const METADATA_MAX_KEYS = 50;
const METADATA_KEY_MAX = 40;
const METADATA_VALUE_MAX = 500;

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

/**
 * Reads Stripe-style parameters with Stripe's coercions and errors: integers and booleans
 * arrive as strings, unknown parameters are refused (`parameter_unknown`), and nested
 * parameters are named with brackets (`automatic_payment_methods[enabled]`).
 */
export class Params {
  private readonly raw: RawParams;
  private readonly prefix: string;

  constructor(raw: unknown, allowed: readonly string[], prefix = '') {
    this.prefix = prefix;
    if (raw === undefined || raw === '') {
      this.raw = {};
    } else if (isRecord(raw)) {
      this.raw = raw;
    } else {
      throw invalidRequest(`Invalid object`, { param: prefix || undefined });
    }
    const known = new Set([...allowed, ...(prefix ? [] : ['expand'])]);
    for (const key of Object.keys(this.raw)) {
      if (!known.has(key)) {
        throw invalidRequest(
          `Received unknown parameter: ${this.name(key)} (not accepted by Stripe here, or not modelled by the payments fake)`,
          { param: this.name(key), code: 'parameter_unknown' },
        );
      }
    }
  }

  name(key: string): string {
    return this.prefix ? `${this.prefix}[${key}]` : key;
  }

  has(key: string): boolean {
    return this.raw[key] !== undefined;
  }

  private scalar(key: string): string | undefined {
    const value = this.raw[key];
    if (value === undefined) return undefined;
    if (typeof value !== 'string') {
      throw invalidRequest(`Invalid ${this.name(key)}: expected a single value`, { param: this.name(key) });
    }
    return value;
  }

  private missing(key: string): never {
    throw invalidRequest(`Missing required param: ${this.name(key)}.`, {
      param: this.name(key),
      code: 'parameter_missing',
    });
  }

  string(key: string, maxLength = 5000): string | undefined {
    const value = this.scalar(key);
    if (value !== undefined && value.length > maxLength) {
      throw invalidRequest(`Invalid ${this.name(key)}: must be at most ${maxLength} characters`, {
        param: this.name(key),
      });
    }
    return value;
  }

  requiredString(key: string, maxLength = 5000): string {
    const value = this.string(key, maxLength);
    if (value === undefined) this.missing(key);
    if (value === '') {
      throw invalidRequest(
        `You passed an empty string for '${this.name(key)}'. We assume empty values are an attempt to unset a parameter; however '${this.name(key)}' cannot be unset. You should remove '${this.name(key)}' from your request or supply a non-empty value.`,
        { param: this.name(key), code: 'parameter_invalid_empty' },
      );
    }
    return value;
  }

  /** `undefined` when absent, `null` when sent empty (Stripe's way to unset), else the text. */
  nullableString(key: string, maxLength = 5000): string | null | undefined {
    const value = this.string(key, maxLength);
    if (value === undefined) return undefined;
    return value === '' ? null : value;
  }

  int(key: string): number | undefined {
    const value = this.scalar(key);
    if (value === undefined) return undefined;
    if (!/^-?\d{1,15}$/.test(value)) {
      throw invalidRequest(`Invalid integer: ${value}`, {
        param: this.name(key),
        code: 'parameter_invalid_integer',
      });
    }
    return Number(value);
  }

  requiredInt(key: string): number {
    const value = this.int(key);
    if (value === undefined) this.missing(key);
    return value;
  }

  bool(key: string): boolean | undefined {
    const value = this.scalar(key);
    if (value === undefined) return undefined;
    if (value === 'true') return true;
    if (value === 'false') return false;
    throw invalidRequest(`Invalid boolean: ${value}`, { param: this.name(key) });
  }

  oneOf<T extends string>(key: string, values: readonly T[]): T | undefined {
    const value = this.scalar(key);
    if (value === undefined) return undefined;
    if (!(values as readonly string[]).includes(value)) {
      throw invalidRequest(`Invalid ${this.name(key)}: must be one of ${values.join(', ')}`, {
        param: this.name(key),
      });
    }
    return value as T;
  }

  currency(key = 'currency'): string {
    const value = this.requiredString(key).toLowerCase();
    if (!/^[a-z]{3}$/.test(value)) {
      throw invalidRequest(`Invalid currency: ${value}.`, { param: this.name(key) });
    }
    return value;
  }

  object(key: string, allowed: readonly string[]): Params | undefined {
    const value = this.raw[key];
    if (value === undefined) return undefined;
    return new Params(value, allowed, this.name(key));
  }

  /** Arrays arrive as `x[0]=a&x[1]=b`; `qs` gives an array, or an object when indexes are large. */
  stringArray(key: string): string[] | undefined {
    const value = this.raw[key];
    if (value === undefined) return undefined;
    let items: unknown[];
    if (Array.isArray(value)) items = value;
    else if (isRecord(value) && Object.keys(value).every((k) => /^\d+$/.test(k))) {
      items = Object.keys(value)
        .sort((a, b) => Number(a) - Number(b))
        .map((k) => value[k]);
    } else if (value === '') items = [];
    else throw invalidRequest(`Invalid array`, { param: this.name(key) });
    return items.map((item) => {
      if (typeof item !== 'string') throw invalidRequest(`Invalid array`, { param: this.name(key) });
      return item;
    });
  }

  expand(): string[] {
    return this.stringArray('expand') ?? [];
  }

  /**
   * Stripe's metadata semantics: a key set to '' is removed, `metadata=''` clears everything,
   * at most 50 keys, keys up to 40 and values up to 500 characters.
   */
  metadata(existing: Metadata = {}): Metadata | undefined {
    const value = this.raw.metadata;
    if (value === undefined) return undefined;
    if (value === '') return {};
    if (!isRecord(value)) throw invalidRequest('Invalid metadata: must be an object', { param: 'metadata' });
    const next: Metadata = { ...existing };
    for (const [key, item] of Object.entries(value)) {
      const param = `metadata[${key}]`;
      if (typeof item !== 'string') throw invalidRequest(`Invalid ${param}: must be a string`, { param });
      if (key.length > METADATA_KEY_MAX) {
        throw invalidRequest(`Metadata keys can have up to ${METADATA_KEY_MAX} characters.`, { param });
      }
      if (item.length > METADATA_VALUE_MAX) {
        throw invalidRequest(`Metadata values can have up to ${METADATA_VALUE_MAX} characters.`, { param });
      }
      if (item === '') delete next[key];
      else next[key] = item;
    }
    if (Object.keys(next).length > METADATA_MAX_KEYS) {
      throw invalidRequest(`You can have up to ${METADATA_MAX_KEYS} metadata keys.`, { param: 'metadata' });
    }
    return next;
  }
}
