// The heap policy of the streaming commands (constrain, expand): collect garbage sooner, so peak memory follows
// the small live set (type counts, the model) instead of growing with the text or lemma list streamed through.
import { setFlagsFromString } from 'node:v8'

/**
 * How far past the live set the heap may grow before the next full collection, in percent. V8 otherwise lets
 * the old generation grow up to about four times the live set; at 50% a 10-million-token `constrain` peaks at
 * about half the resident memory and runs as fast (the ratio measured by bench/constrain-scale.ts).
 */
export const STREAMING_HEAP_GROWTH_PERCENT = 50

/**
 * Ask V8 to keep the heap close to the live set for the rest of this process. Learning is not a streaming
 * command: its live set is large and collections cost it time, so it keeps V8's own policy.
 * @example preferSmallHeap() // at the start of a streaming command
 */
export function preferSmallHeap(): void {
  setFlagsFromString(`--heap-growing-percent=${STREAMING_HEAP_GROWTH_PERCENT}`)
}
