/**
 * Shape checks on a JSON body, around express.json: a nesting limit read from the raw bytes before
 * JSON.parse and class-transformer recurse into them (a few thousand levels overflow the stack), and
 * a reviver that keeps float edges out of the database. OWASP ASVS 4.0.3 V5.1.4 (structured data is
 * checked against its expected shape) and V5.1.3 (positive input validation).
 */

/** Deepest nesting of objects and arrays a request body may have; our DTOs go three levels deep. */
export const JSON_DEPTH_LIMIT = 32;

const OPEN_BRACE = 0x7b;
const OPEN_BRACKET = 0x5b;
const CLOSE_BRACE = 0x7d;
const CLOSE_BRACKET = 0x5d;
const QUOTE = 0x22;
const BACKSLASH = 0x5c;

/** How deeply the JSON text nests, counting brackets outside strings (UTF-8 continuation bytes never match). */
export function exceedsDepth(raw: Uint8Array, limit = JSON_DEPTH_LIMIT): boolean {
  let depth = 0;
  let inString = false;
  for (let i = 0; i < raw.length; i++) {
    const b = raw[i];
    if (inString) {
      if (b === BACKSLASH) i++;
      else if (b === QUOTE) inString = false;
    } else if (b === QUOTE) inString = true;
    else if (b === OPEN_BRACE || b === OPEN_BRACKET) {
      if (++depth > limit) return true;
    } else if (b === CLOSE_BRACE || b === CLOSE_BRACKET) depth--;
  }
  return false;
}

/** Smallest positive normal double (2^-1022); smaller magnitudes are subnormal. */
const MIN_NORMAL = 2 ** -1022;

/**
 * JSON.parse reviver: -0 and subnormal numbers (such as 5e-324) become 0. No measurement, position or
 * count is that close to zero, and the driver and DECIMAL columns treat them unevenly; the DTO ranges
 * then judge the 0 like any other value.
 */
export function flushFloatEdges(_key: string, value: unknown): unknown {
  if (typeof value === 'number' && (Object.is(value, -0) || (value !== 0 && Math.abs(value) < MIN_NORMAL))) return 0;
  return value;
}
