/**
 * TextEncoder and TextDecoder exist in every place the engine runs (browsers, workers, Node ≥ 11) but are not part of
 * the ES2022 library the engine type-checks against, so they are typed here, narrowly, once for all binary formats.
 */
interface Utf8Codec {
  TextEncoder: new () => { encode(text: string): Uint8Array };
  TextDecoder: new (label: string, options: { fatal: boolean }) => { decode(bytes: Uint8Array): string };
}
export const { TextEncoder, TextDecoder } = globalThis as unknown as Utf8Codec;
