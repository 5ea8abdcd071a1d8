// Test models for the HTTP suites: the embedded demo model, and a second version of it listing one more lemma.
import { listLemmas } from '../../src/core/model/build-model.ts'
import { decodeModel } from '../../src/core/model/decode-model.ts'
import { encodeModel } from '../../src/core/model/encode-model.ts'
import { DEMO_MODEL_TEXT } from '../../src/http/demo-model.generated.ts'

/**
 * A lemma in no demo file, shaped like the demo language's class N1 nouns (-a, feminine, with gradation;
 * demo-lexicon/README.md): the second model version lists it without a table, so the model predicts its forms.
 */
export const ADDED_LEMMA = { lemma: 'hakkara', upos: 'NOUN', feats: 'Gender=Fem' }

const encoder = new TextEncoder()

/** Version 1: the demo model file's bytes. */
export const modelV1: Uint8Array = encoder.encode(DEMO_MODEL_TEXT)

let v2: Uint8Array | undefined
/** Version 2: the demo model with `ADDED_LEMMA` listed (a different, valid model file). */
export function modelV2(): Uint8Array {
  v2 ??= encoder.encode(encodeModel(listLemmas(decodeModel(DEMO_MODEL_TEXT), [ADDED_LEMMA])))
  return v2
}

/** Byte strings that are not model files, each named by what is wrong with it. */
export function corruptModels(): [string, Uint8Array][] {
  const text = DEMO_MODEL_TEXT
  const json = JSON.parse(text) as Record<string, unknown>
  return [
    ['a truncated model file', encoder.encode(text.slice(0, Math.floor(text.length / 2)))],
    ['bytes that are not UTF-8', new Uint8Array([0x7b, 0xff, 0xfe, 0x7d])],
    ['JSON that is not a model', encoder.encode('{"hello":"world"}')],
    ['a model of a newer major version', encoder.encode(JSON.stringify({ ...json, version: '99.0' }))],
    ['a model whose entries are missing', encoder.encode(JSON.stringify({ ...json, entries: undefined }))],
    ['an empty body', new Uint8Array(0)],
  ]
}
