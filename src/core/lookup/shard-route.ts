// Which shard a form lives in: FNV-1a 32 over the UTF-8 bytes of its routing key (NFC, folded, lower case).
import { foldDiacritics } from './normalize.ts'

/** How shards are chosen, as the manifest names it. */
export const SHARD_HASH = 'fnv1a32-utf8'
/** The key hashed, as the manifest names it: NFC, diacritics folded, lower-cased. */
export const SHARD_ROUTE = 'nfc-fold-lower'

/**
 * FNV-1a, 32 bits (offset basis 2166136261, prime 16777619; Fowler, Noll & Vo), over bytes.
 * @example fnv1a32(new TextEncoder().encode('a')) // 0xe40c292c
 */
export function fnv1a32(bytes: Uint8Array): number {
  let h = 0x811c9dc5
  for (let i = 0; i < bytes.length; i++) {
    h ^= bytes[i]!
    h = Math.imul(h, 0x01000193)
  }
  return h >>> 0
}

/**
 * The string a form is routed by. Every spelling one lookup of a token tries (its lower- and title-case
 * forms, its diacritic-folded forms) has the same routing key, so a token's lookups stay in one shard.
 * @example routeKey('Mäntel') // 'mantel'
 */
export function routeKey(form: string): string {
  return isAscii(form) ? form.toLowerCase() : foldDiacritics(form.normalize('NFC')).toLowerCase()
}

function isAscii(s: string): boolean {
  for (let i = 0; i < s.length; i++) if (s.charCodeAt(i) >= 0x80) return false
  return true
}

/** FNV-1a 32 of a well-formed string's UTF-8 bytes, without encoding it first (as `fnv1a32(encode(s))`). */
export function fnv1a32Utf8(s: string): number {
  let h = 0x811c9dc5
  for (let i = 0; i < s.length; i++) {
    let c = s.charCodeAt(i)
    if (c < 0x80) {
      h = Math.imul(h ^ c, 0x01000193)
      continue
    }
    if (c >= 0xd800 && c < 0xdc00 && i + 1 < s.length) {
      const d = s.charCodeAt(i + 1)
      if (d >= 0xdc00 && d < 0xe000) {
        c = 0x10000 + ((c - 0xd800) << 10) + (d - 0xdc00)
        i++
      }
    }
    if (c < 0x800) {
      h = Math.imul(h ^ (0xc0 | (c >> 6)), 0x01000193)
    } else if (c < 0x10000) {
      h = Math.imul(h ^ (0xe0 | (c >> 12)), 0x01000193)
      h = Math.imul(h ^ (0x80 | ((c >> 6) & 63)), 0x01000193)
    } else {
      h = Math.imul(h ^ (0xf0 | (c >> 18)), 0x01000193)
      h = Math.imul(h ^ (0x80 | ((c >> 12) & 63)), 0x01000193)
      h = Math.imul(h ^ (0x80 | ((c >> 6) & 63)), 0x01000193)
    }
    h = Math.imul(h ^ (0x80 | (c & 63)), 0x01000193)
  }
  return h >>> 0
}

/**
 * The shard of a form (or of a folded key) among `shards`.
 * @example shardOf('Tage', 8) === shardOf('TAGE', 8) // true
 */
export function shardOf(form: string, shards: number): number {
  if (shards <= 1) return 0
  return fnv1a32Utf8(routeKey(form)) % shards
}

/**
 * Hex SHA-256 of bytes (Web Crypto, a global in Node, workerd and browsers).
 * @example await sha256Hex(new TextEncoder().encode('abc')) // 'ba7816bf…'
 */
export async function sha256Hex(bytes: Uint8Array): Promise<string> {
  const digest = new Uint8Array(await crypto.subtle.digest('SHA-256', bytes as Uint8Array<ArrayBuffer>))
  let out = ''
  for (const b of digest) out += b.toString(16).padStart(2, '0')
  return out
}
