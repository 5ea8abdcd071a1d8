// Assemble one CoNLL-U sentence line by line, checking the ID sequence the UD v2 format requires.
import type { Problem } from '../core/lexicon/problem.ts'
import type { ConlluLine, ConlluWord } from './conllu-line.ts'
import { problemAt, type Where } from './fields.ts'
import type { CorpusToken } from './text-tokens.ts'

/** A token of the running text: a plain word (`id` "3") or a multi-word token (`id` "3-4"). */
export interface SurfaceToken extends CorpusToken {
  id: string
}

/**
 * A sentence: `surface` tokens are what a tokenizer sees (lookup input); `words` are the syntactic words
 * with gold LEMMA/UPOS/FEATS/MISC (evaluation input). Empty nodes appear in neither.
 * @example Spanish "del" (UD guidelines): surface [{id:'1-2', form:'del'}], words de (ADP) + el (DET), token 0
 */
export interface ConlluSentence {
  /** Line of the sentence's first line (comment or word). */
  line: number
  comments: string[]
  surface: SurfaceToken[]
  words: ConlluWord[]
}

/** Collects the lines of one sentence; `add` returns a problem when the ID sequence breaks. */
export class SentenceBuilder {
  readonly sentence: ConlluSentence
  lineCount = 0
  problem: Problem | undefined
  readonly features: string[] = []
  #range: { from: number; to: number; token: number; line: number } | undefined
  #nextEmpty = 1

  constructor(line: number) {
    this.sentence = { line, comments: [], surface: [], words: [] }
  }

  add(item: ConlluLine, at: Where): Problem | undefined {
    const { surface, words } = this.sentence
    const bad = (message: string) => problemAt('bad-conllu', message, at)
    const next = words.length + 1
    if (item.kind === 'empty') {
      if (item.after !== words.length)
        return bad(`empty node ${item.after}.${item.minor} must follow word ${item.after}`)
      if (item.minor !== this.#nextEmpty) {
        return bad(
          `empty node ${item.after}.${item.minor} out of order (expected ${item.after}.${this.#nextEmpty})`,
        )
      }
      this.#nextEmpty++
      return undefined
    }
    if (item.kind === 'range') {
      const id = `${item.from}-${item.to}`
      if (this.#range) return bad(`multi-word token ${id} overlaps ${this.#range.from}-${this.#range.to}`)
      if (item.from !== next)
        return bad(`multi-word token ${id} must come just before word ${item.from}, not ${next}`)
      this.#range = { from: item.from, to: item.to, token: surface.length, line: at.line }
      surface.push({ form: item.form, line: at.line, sentenceInitial: surface.length === 0, id })
      return undefined
    }
    const { word } = item
    if (word.id !== next) return bad(`word ID ${word.id} out of order (expected ${next})`)
    this.#nextEmpty = 1
    let token: number
    if (this.#range) {
      token = this.#range.token
      if (word.id === this.#range.to) this.#range = undefined
    } else {
      token = surface.length
      surface.push({
        form: word.form,
        line: at.line,
        sentenceInitial: surface.length === 0,
        id: String(word.id),
      })
    }
    words.push({ ...word, token })
    this.features.push(...item.languageSpecific)
    return undefined
  }

  /** The problem a complete sentence still has: a multi-word token running past the last word. */
  finish(file: string): Problem | undefined {
    if (!this.#range) return undefined
    const { from, to, line } = this.#range
    const last = this.sentence.words.length
    return problemAt(
      'bad-conllu',
      `multi-word token ${from}-${to} runs past the sentence's last word ${last}`,
      {
        file,
        line,
      },
    )
  }
}
