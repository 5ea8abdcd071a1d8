// Normalization before lookup: NFC, case fallbacks, apostrophe and quote variants, optional diacritic folding.

/** One string to look up and how it was derived from the token (`exact`, `nfc`, `lowercase`, `quotes+titlecase`, …). */
export interface LookupKey {
  key: string
  how: string
  /** The key is a diacritic-folded spelling: resolve it through `FormIndex.folded`. */
  folded: boolean
}

export interface NormalizeOptions {
  /** Also try the token without diacritics (off by default: in many languages they carry the grammar). */
  foldDiacritics?: boolean
}

/** Apostrophe look-alikes, tried both as U+0027 and as U+2019 (dictionaries use either). */
const APOSTROPHES = /['\u2019\u2018\u02bc\u00b4\u0060\u2032\uff07]/g
/** Quotation marks that tokenizers leave stuck to a word's edge (common practice: strip them). */
const EDGE_QUOTES =
  /^["\u201c\u201d\u201e\u201f\u00ab\u00bb\u2039\u203a\u201a]+|["\u201c\u201d\u201e\u201f\u00ab\u00bb\u2039\u203a\u201a]+$/g

/**
 * Strip diacritics: decompose, drop combining marks, recompose.
 * @example foldDiacritics('Mäntel') // 'Mantel'
 */
export function foldDiacritics(text: string): string {
  return text.normalize('NFD').replace(/\p{M}/gu, '').normalize('NFC')
}

/** The first letter upper case, the rest lower case. */
export function titleCase(text: string): string {
  const first = text.codePointAt(0)
  if (first === undefined) return text
  const head = String.fromCodePoint(first)
  return head.toUpperCase() + text.slice(head.length).toLowerCase()
}

/**
 * The keys to look a token up under, in tiers: a later tier is consulted only when no key of the earlier
 * tiers is indexed. Tier 1: the NFC token and, when it has capitals (sentence-initial, all caps), its
 * lower-case and title-case forms — all of them, since "Die" may be the article or a noun. Tier 2: the
 * title-case form of a lower-case token (languages that capitalize nouns). Tier 3: apostrophe and
 * quote variants with the same case forms. Tier 4 (opt-in): the folded spellings of all of the above.
 * @example lookupTiers('HAUS')[0].map((k) => k.key) // ['HAUS', 'haus', 'Haus']
 */
export function lookupTiers(token: string, opts: NormalizeOptions = {}): LookupKey[][] {
  const base = token.normalize('NFC')
  const seen = new Set<string>()
  const tier = (keys: LookupKey[]) => keys.filter((k) => !seen.has(k.key) && k.key !== '' && seen.add(k.key))
  const tiers: LookupKey[][] = [tier(caseKeys(base, base === token ? 'exact' : 'nfc'))]
  if (base === base.toLowerCase())
    tiers.push(tier([{ key: titleCase(base), how: 'titlecase', folded: false }]))
  const spellings = new Set([
    base.replace(EDGE_QUOTES, ''),
    base.replace(APOSTROPHES, "'"),
    base.replace(APOSTROPHES, '\u2019'),
  ])
  spellings.delete(base)
  tiers.push(tier([...spellings].flatMap((s) => caseKeys(s, 'quotes'))))
  if (opts.foldDiacritics) {
    const all = tiers.flat()
    const folded = [{ key: base, how: 'exact' }, ...all].map((k) => ({
      key: foldDiacritics(k.key),
      how: k.how === 'exact' || k.how === 'nfc' ? 'folded' : `folded+${k.how}`,
      folded: true,
    }))
    // Folded keys live in their own namespace: the same string may also be a plain key.
    const own = new Set<string>()
    tiers.push(folded.filter((k) => !own.has(k.key) && own.add(k.key)))
  }
  return tiers.filter((t) => t.length > 0)
}

function caseKeys(spelling: string, how: string): LookupKey[] {
  const out: LookupKey[] = [{ key: spelling, how, folded: false }]
  const lower = spelling.toLowerCase()
  if (lower === spelling) return out
  const step = (s: string) => (how === 'exact' || how === 'nfc' ? s : `${how}+${s}`)
  out.push({ key: lower, how: step('lowercase'), folded: false })
  const title = titleCase(spelling)
  if (title !== spelling && title !== lower) out.push({ key: title, how: step('titlecase'), folded: false })
  return out
}

/**
 * Every string a lookup of these tokens may consult (what a sharded index must load first); folded keys
 * are included as they are and resolved by the index.
 * @example lookupKeys(['Tage'], {}) // ['Tage', 'tage']
 */
export function lookupKeys(tokens: Iterable<string>, opts: NormalizeOptions = {}): string[] {
  const out = new Set<string>()
  for (const t of tokens) for (const tier of lookupTiers(t, opts)) for (const k of tier) out.add(k.key)
  return [...out]
}
