// Strings that hold their own characters, for keys a long-lived map keeps.

const encoder = new TextEncoder()
const decoder = new TextDecoder()

/**
 * A copy of `s` that holds its own characters. A token cut out of a longer line may be kept by the engine as
 * a view into that line, so a tally that keeps every form type would keep every line it came from alive;
 * copy a key once, when it is first stored.
 * @example counts.set(ownCopy(token.form), 1)
 */
export function ownCopy(s: string): string {
  return decoder.decode(encoder.encode(s))
}
