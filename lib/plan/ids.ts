/**
 * Element ids: short, URL-safe, chosen by the editor and kept for the element's whole life (a
 * seat keeps its id across revisions, so occupant assignments and feedback stay attached).
 */
const ALPHABET = "abcdefghijkmnpqrstuvwxyz23456789";

export type RandomSource = () => number;

/** `prefix-xxxxxx` with six characters from a 32-letter alphabet (≈ 10⁹ values), unused in `taken`. */
export function newId(prefix: string, taken: ReadonlySet<string>, random: RandomSource = Math.random): string {
  for (;;) {
    let suffix = "";
    for (let i = 0; i < 6; i += 1) suffix += ALPHABET[Math.floor(random() * ALPHABET.length) % ALPHABET.length];
    const id = `${prefix}-${suffix}`;
    if (!taken.has(id)) return id;
  }
}
