/**
 * A short fingerprint of any plain data: FNV-1a (32 bit) over canonical JSON of it (keys sorted), written
 * as two groups of four hex digits. Not a security measure — anyone can make a printout with any
 * fingerprint — only a quick way for two people to see that two printouts were worked out from the same
 * things. Small on purpose: the app's shell prints it on every page.
 */

const FNV_OFFSET_BASIS_32 = 0x811c9dc5;
const FNV_PRIME_32 = 0x01000193;

/** The UTF-8 bytes of a string (TextEncoder is not in the core's ES2022 library, so by hand). */
function utf8(text: string): number[] {
  const out: number[] = [];
  for (const ch of text) {
    const c = ch.codePointAt(0)!;
    if (c < 0x80) out.push(c);
    else if (c < 0x800) out.push(0xc0 | (c >> 6), 0x80 | (c & 63));
    else if (c < 0x10000) out.push(0xe0 | (c >> 12), 0x80 | ((c >> 6) & 63), 0x80 | (c & 63));
    else out.push(0xf0 | (c >> 18), 0x80 | ((c >> 12) & 63), 0x80 | ((c >> 6) & 63), 0x80 | (c & 63));
  }
  return out;
}

/**
 * FNV-1a, 32 bit, over the UTF-8 bytes of `text`: for each byte, xor then multiply by the FNV prime
 * (Fowler, Noll, Vo; the algorithm and its offset basis and prime as in Eastlake et al., "The FNV
 * Non-Cryptographic Hash Algorithm", IETF draft-eastlake-fnv).
 */
export function fnv1a32(text: string): number {
  let h = FNV_OFFSET_BASIS_32;
  for (const b of utf8(text)) {
    h ^= b;
    h = Math.imul(h, FNV_PRIME_32) >>> 0;
  }
  return h >>> 0;
}

/** JSON with every object's keys sorted, so equal inputs give equal text whatever order they were built in. */
export function canonicalJson(value: unknown): string {
  return JSON.stringify(value, (_k, v: unknown) => {
    if (v && typeof v === "object" && !Array.isArray(v)) {
      return Object.fromEntries(Object.entries(v as Record<string, unknown>).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)));
    }
    return v;
  });
}

/** A short fingerprint of any inputs: eight hex digits as "xxxx-xxxx". */
export function fingerprint(inputs: unknown): string {
  const hex = fnv1a32(canonicalJson(inputs)).toString(16).padStart(8, "0");
  return `${hex.slice(0, 4)}-${hex.slice(4)}`;
}

