// Types for `vlq`: the package ships them, but its `exports` map does not point at them.
declare module 'vlq' {
  /** Base64 VLQ text of one integer or a list of integers. */
  export function encode(value: number | number[]): string
  /** The integers of a base64 VLQ text. */
  export function decode(text: string): number[]
}
