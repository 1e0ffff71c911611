/**
 * Invented names built from syllables. Onsets such as `kw`, `zh` and `q` without `u` are
 * chosen because they are rare in Latin and Greek, so that a name is unlikely to coincide
 * with a real genus or place; any coincidence is accidental.
 */
import { pick, type Rng } from './random';

const ONSETS = ['b', 'br', 'd', 'dr', 'f', 'g', 'gl', 'h', 'k', 'kw', 'l', 'm', 'n', 'p', 'q', 'r', 's', 'sk', 't', 'th', 'v', 'vr', 'x', 'z', 'zh'] as const;
const VOWELS = ['a', 'e', 'i', 'o', 'u', 'ae', 'ei', 'ou', 'y'] as const;
const CODAS = ['', '', '', 'l', 'n', 'r', 's', 'k', 'x', 'rn', 'lv', 'sk', 'mb'] as const;
/** Joins a stem that ends in a vowel to an ending that starts with one. */
const LINKS = ['d', 'k', 'l', 'm', 'n', 'r', 's', 'th', 'v', 'x'] as const;

const GENUS_ENDINGS = ['ites', 'ella', 'odon', 'ops', 'ina', 'ura', 'axis', 'eon', 'ix', 'aspis', 'ichnus', 'oma', 'ostrea', 'ocrinus', 'aria'] as const;
const CLADE_ENDINGS = ['morpha', 'ida', 'oidea', 'acea'] as const;
const LAND_ENDINGS = ['avar', 'esse', 'ora', 'undra', 'eth', 'ai'] as const;

function syllable(rng: Rng): string {
  return pick(rng, ONSETS) + pick(rng, VOWELS) + pick(rng, CODAS);
}

function capitalise(s: string): string {
  return s[0].toUpperCase() + s.slice(1);
}

function stem(rng: Rng, syllables: number): string {
  let s = '';
  for (let i = 0; i < syllables; i++) s += syllable(rng);
  return /[aeiouy]$/.test(s) ? s + pick(rng, LINKS) : s;
}

/** A name not yet in `taken` (which it joins), from the stem maker and an ending. */
function uniqueName(taken: Set<string>, make: () => string): string {
  for (;;) {
    const name = capitalise(make());
    if (!taken.has(name)) {
      taken.add(name);
      return name;
    }
  }
}

export function genusName(rng: Rng, taken: Set<string>): string {
  return uniqueName(taken, () => stem(rng, 2) + pick(rng, GENUS_ENDINGS));
}

export function cladeName(rng: Rng, taken: Set<string>): string {
  return uniqueName(taken, () => stem(rng, 2) + pick(rng, CLADE_ENDINGS));
}

export function landName(rng: Rng, taken: Set<string>): string {
  return uniqueName(taken, () => stem(rng, 2) + pick(rng, LAND_ENDINGS));
}
