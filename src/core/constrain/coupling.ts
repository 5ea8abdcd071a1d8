// Token and type constraints coupled, by the rule of Täckström, Das, Petrov, McDonald and Nivre (2013),
// "Token and Type Constraints for Cross-Lingual Part-of-Speech Tagging", TACL 1, §4 (coupled constraints).

import { isUpos } from '../lexicon/feats.ts'
import type { Problem } from '../lexicon/problem.ts'

/** Which case of the rule decided a token's allowed set. */
export type CouplingRule =
  /** The token tag is among the type's tags: the intersection, that one tag. */
  | 'intersection'
  /** The token tag is not among the type's tags: the intersection is empty, so the type constraint. */
  | 'fallback'
  /** The type is unconstrained (no analysis): the token tag alone. */
  | 'token'
  /** No token tag: the type constraint. */
  | 'type'
  /** Neither: every tag allowed. */
  | 'unconstrained'

export interface Coupled {
  /** Allowed tags, sorted; null when every tag is allowed. */
  allowed: string[] | null
  rule: CouplingRule
}

/**
 * Couple a type constraint (null = unconstrained) with a token's tag from elsewhere (e.g. projected across
 * a word-aligned translation): the intersection of the two, falling back to the type constraint when the
 * intersection is empty. An unconstrained type allows every tag, so its intersection is the token tag.
 * @example coupleConstraints(['NOUN', 'VERB'], 'VERB') // { allowed: ['VERB'], rule: 'intersection' }
 * @example coupleConstraints(['NOUN', 'VERB'], 'ADJ') // { allowed: ['NOUN', 'VERB'], rule: 'fallback' }
 */
export function coupleConstraints(
  typeAllowed: readonly string[] | null,
  tokenTag: string | undefined,
): Coupled {
  if (tokenTag === undefined) {
    return typeAllowed
      ? { allowed: [...typeAllowed], rule: 'type' }
      : { allowed: null, rule: 'unconstrained' }
  }
  if (!typeAllowed) return { allowed: [tokenTag], rule: 'token' }
  if (typeAllowed.includes(tokenTag)) return { allowed: [tokenTag], rule: 'intersection' }
  return { allowed: [...typeAllowed], rule: 'fallback' }
}

/** Where a token's own tag is read: the UPOS column, or a `KEY=VALUE` attribute of MISC. */
export type TokenTagSource = { column: 'upos' } | { column: 'misc'; key: string }

/**
 * Parse `upos` or `misc:KEY` (the command-line spelling).
 * @example parseTokenTagSource('misc:Projected') // { column: 'misc', key: 'Projected' }
 */
export function parseTokenTagSource(text: string): TokenTagSource | undefined {
  if (text === 'upos') return { column: 'upos' }
  const m = /^misc:([A-Za-z][A-Za-z0-9_.-]*)$/.exec(text)
  return m ? { column: 'misc', key: m[1]! } : undefined
}

/**
 * A word's token tag from its UPOS and MISC columns: undefined when absent (`_`), a problem when it is not
 * one of the 17 UPOS tags.
 * @example tokenTagOf('_', 'Projected=NOUN|SpaceAfter=No', { column: 'misc', key: 'Projected' }) // { tag: 'NOUN' }
 */
export function tokenTagOf(
  upos: string,
  misc: string,
  source: TokenTagSource,
): { tag: string | undefined } | { problem: Problem } {
  let tag: string | undefined
  if (source.column === 'upos') tag = upos
  else tag = miscValue(misc, source.key)
  if (tag === undefined || tag === '_' || tag === '') return { tag: undefined }
  if (!isUpos(tag)) {
    const where = source.column === 'upos' ? 'UPOS column' : `MISC ${source.key}`
    return {
      problem: { code: 'bad-upos', message: `token tag "${tag}" in ${where} is not one of the 17 UPOS tags` },
    }
  }
  return { tag }
}

/**
 * The value of a MISC attribute, or undefined.
 * @example miscValue('SpaceAfter=No|Gloss=cat', 'Gloss') // 'cat'
 */
export function miscValue(misc: string, key: string): string | undefined {
  if (misc === '_') return undefined
  for (const part of misc.split('|')) {
    if (part.startsWith(`${key}=`)) return part.slice(key.length + 1)
  }
  return undefined
}

/**
 * MISC with one attribute set (replacing any earlier value of the key), others kept in order.
 * @example setMiscValue('SpaceAfter=No', 'Allowed', 'NOUN,VERB') // 'SpaceAfter=No|Allowed=NOUN,VERB'
 */
export function setMiscValue(misc: string, key: string, value: string): string {
  const parts = misc === '_' ? [] : misc.split('|').filter((p) => !p.startsWith(`${key}=`))
  parts.push(`${key}=${value}`)
  return parts.join('|')
}
