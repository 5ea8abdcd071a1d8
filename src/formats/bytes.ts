// Byte buffers: joining the chunks a stream gave into one.

/**
 * One new buffer holding `parts` in order; `total` is their summed length.
 * @example concatBytes([new Uint8Array([1]), new Uint8Array([2, 3])], 3) // Uint8Array [1, 2, 3]
 */
export function concatBytes(parts: readonly Uint8Array[], total: number): Uint8Array {
  const out = new Uint8Array(total)
  let at = 0
  for (const p of parts) {
    out.set(p, at)
    at += p.byteLength
  }
  return out
}
