// Random Sulvašti roots of a given shape, and the stratum key that says which sub-pattern a root shows.
import {
  GRADATION,
  GRADING_SHARE,
  LONG_ROOT_SHARE,
  LONG_VOWELS,
  ONSETS,
  PLAIN_CLUSTERS,
  ROOT_VOWELS,
  STEM_FINAL_VOWELS,
} from '../grammar/sounds.ts'
import type { RootShape, WordClass } from '../grammar/types.ts'
import { classHarmony } from './inflect.ts'
import { gradationSite, harmonyOf } from './phonology.ts'
import type { Rng } from './prng.ts'

const GRADING = Object.keys(GRADATION)

/** A syllable nucleus and following plain cluster, drawn in one harmony. */
function openSyllables(rng: Rng, vowels: readonly string[]): string {
  let out = rng.pick(ONSETS) + rng.pick(vowels)
  if (rng.chance(LONG_ROOT_SHARE)) out += rng.pick(PLAIN_CLUSTERS) + rng.pick(vowels)
  return out
}

/**
 * A random root of a shape. Cluster and vstem roots end in an alternating cluster about half the time.
 * @example
 * makeRoot(makeRng(3), { kind: 'cluster' }) // e.g. 'lokk'
 */
export function makeRoot(rng: Rng, shape: RootShape): string {
  const harmony = rng.chance(0.55) ? 'back' : 'front'
  const vowels = ROOT_VOWELS[harmony]
  const cluster = (): string => (rng.chance(GRADING_SHARE) ? rng.pick(GRADING) : rng.pick(PLAIN_CLUSTERS))
  switch (shape.kind) {
    case 'cluster':
      return openSyllables(rng, vowels) + cluster()
    case 'vstem': {
      const head = openSyllables(rng, vowels) + cluster()
      return head + rng.pick(STEM_FINAL_VOWELS[harmonyOf(head)])
    }
    case 'cfinal': {
      const vowel = (): string => {
        let v = rng.pick(vowels)
        while (shape.notBefore?.includes(v)) v = rng.pick(vowels)
        return v
      }
      const head = rng.pick(ONSETS) + (rng.chance(0.7) ? rng.pick(vowels) + rng.pick(PLAIN_CLUSTERS) : '')
      return head + vowel() + rng.pick(shape.finals)
    }
    case 'long': {
      let onset = rng.pick(ONSETS)
      while (onset === '') onset = rng.pick(ONSETS)
      return onset + rng.pick(LONG_VOWELS)
    }
  }
}

/** True when a root fits its class's shape (used to check the fixed roots of the data files). */
export function fitsShape(root: string, shape: RootShape): boolean {
  const last = root[root.length - 1] ?? ''
  const vowel = /[aeiouäöū]/i
  switch (shape.kind) {
    case 'cluster':
      return !vowel.test(last) && vowel.test(root)
    case 'vstem':
      return vowel.test(last) && root.length >= 2
    case 'cfinal':
      return shape.finals.includes(last) && !shape.notBefore?.includes(root[root.length - 2] ?? '')
    case 'long':
      return LONG_VOWELS.some((v) => root.endsWith(v)) && !vowel.test(root[0] ?? '')
  }
}

/**
 * The sub-pattern a root shows in its class: harmony, alternating cluster, final consonant, long vowel.
 * @example
 * stratumKey(N1, 'lokk') // 'harmony=back grade=kk'
 */
export function stratumKey(cls: WordClass, root: string): string {
  const parts = cls.strata.map((s) => {
    switch (s) {
      case 'harmony':
        return `harmony=${classHarmony(cls, root)}`
      case 'grade': {
        const site = gradationSite(root)
        return `grade=${site ? root.slice(site.start, site.end) : 'none'}`
      }
      case 'final':
        return `final=${root[root.length - 1]}`
      default:
        return `vowel=${LONG_VOWELS.find((v) => root.endsWith(v))}`
    }
  })
  return parts.join(' ')
}
