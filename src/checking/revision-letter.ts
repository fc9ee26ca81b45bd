/**
 * Revision letters: 1 → A, 26 → Z, 27 → AA, 28 → AB … (bijective base 26, as drawing registers
 * number revisions once the alphabet runs out).
 */
export function revisionLetter(sequence: number): string {
  if (!Number.isInteger(sequence) || sequence < 1) throw new RangeError(`A revision sequence is a whole number from 1 (got ${sequence})`);
  let n = sequence;
  let out = "";
  while (n > 0) {
    const r = (n - 1) % 26;
    out = String.fromCharCode(65 + r) + out;
    n = Math.floor((n - 1) / 26);
  }
  return out;
}

/** The sequence a letter stands for, or null when it is not a revision letter. */
export function revisionSequence(letter: string): number | null {
  if (!/^[A-Z]{1,4}$/.test(letter)) return null;
  let n = 0;
  for (const c of letter) n = n * 26 + (c.charCodeAt(0) - 64);
  return n;
}
