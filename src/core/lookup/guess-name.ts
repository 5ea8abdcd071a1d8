// Proper-name guesses: a capitalized token the index lacks in that spelling may be a name (PROPN).
import { isCapitalized, type LookupModel } from './lookup-context.ts'

/** The UD tag a name guess carries. */
export const NAME_UPOS = 'PROPN'

/** Where a token stands: known not to start a sentence (`false`), or possibly starting one (`true`, unknown). */
export type NamePosition = boolean | undefined

const shares = new WeakMap<object, number>()

/**
 * P(PROPN | a word written with a capital), from the dictionary itself: of its lemmas that start with a
 * capital, the share that are PROPN (add-one smoothed). High where only names are capitalized (English),
 * low where nouns are too (German, so noun guesses keep most of the mass); 0 for a dictionary that lists
 * no PROPN lemma at all (its tag set is not the one to add names to): no name guesses there.
 * @example nameShare(model) // 0.93 for an English dictionary, 0.04 for a German one
 */
export function nameShare(model: LookupModel): number {
  const key = model.inflection.lexicon
  const known = shares.get(key)
  if (known !== undefined) return known
  let names = 0
  let capitalized = 0
  for (const e of model.inflection.lexicon.entries) {
    if (!isCapitalized(e.lemma)) continue
    capitalized++
    if (e.upos === NAME_UPOS) names++
  }
  const share = names === 0 ? 0 : (names + 1) / (capitalized + 2)
  shares.set(key, share)
  return share
}

/**
 * Should a token be offered a name guess? It must start with a capital and not be indexed in exactly that
 * spelling (a dictionary that lists "Haus" or "Atlanta" already says what it is). A token known to stand
 * inside a sentence qualifies when its other cases are at most predicted ("Bill" beside the bare lemma
 * "bill"), not when a table lists them ("The" in a title is still the article); one that may start a
 * sentence ("The", "Bill" first) only when no spelling of it is indexed at all.
 * @example nameCandidate(model, 'Bill', false, billCandidates) // true: mid-sentence, "bill" only predicted
 */
export function nameCandidate(
  model: LookupModel,
  form: string,
  sentenceInitial: NamePosition,
  indexed: readonly { source: string }[] | undefined,
): boolean {
  if (!startsWithCapital(form) || nameShare(model) === 0) return false
  if (model.index.get(form)) return false
  if (!indexed || indexed.length === 0) return true
  return sentenceInitial === false && !indexed.some((c) => c.source === 'attested')
}

/**
 * The name guess itself: lemma = the token as written, no features (a name's are not known), scored by
 * the dictionary's share of names among its capitalized lemmas.
 * @example guessName(model, 'Rhode') // { lemma: 'Rhode', upos: 'PROPN', feats: '_', score: 0.93 }
 */
export function guessName(
  model: LookupModel,
  form: string,
): { lemma: string; upos: string; feats: string; score: number } {
  const score = Number(nameShare(model).toPrecision(4))
  return { lemma: form.normalize('NFC'), upos: NAME_UPOS, feats: '_', score }
}

/** Does the token's first letter have case and is it upper case? ("3D" and "ß" do not.) */
function startsWithCapital(form: string): boolean {
  const c = form.charCodeAt(0)
  if ((c >= 97 && c <= 122) || (c >= 48 && c <= 57)) return false // a-z, 0-9: the common case, no regex
  const first = form.match(/\p{L}/u)?.[0]
  if (first === undefined || form.indexOf(first) !== 0) return false
  return isCapitalized(first)
}
