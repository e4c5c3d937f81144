import seedrandom from 'seedrandom';
import { DomainError } from '../errors/domain-error';

/** Named with every sample so anyone can re-draw it with the same library and seed. */
export const SAMPLE_PRNG = 'seedrandom 3 ARC4 (its default generator), partial Fisher–Yates';

export interface DrawnSample {
  seed: string;
  prng: string;
  /** The chosen ids in the order they were drawn. */
  drawOrder: number[];
  /** The same ids in ascending order, for the worksheet. */
  sorted: number[];
}

/**
 * Draws `sampleSize` ids without replacement. The ids are sorted first, so the draw depends only
 * on the set of ids and the seed, never on the order a query returned them in; then position i
 * swaps with a position chosen from i to the end (a partial Fisher–Yates shuffle).
 */
export function drawSample(
  populationIds: readonly number[],
  sampleSize: number,
  seed: string,
): DrawnSample {
  if (typeof seed !== 'string' || seed.trim() === '') {
    throw new DomainError('seed', 'The seed must be a non-empty piece of text.');
  }
  if (populationIds.length === 0) {
    throw new DomainError('populationIds', 'The population is empty: there is nothing to sample.');
  }
  populationIds.forEach((id, i) => {
    if (typeof id !== 'number' || !Number.isSafeInteger(id)) {
      throw new DomainError(
        'populationIds',
        `Population item ${i + 1} must be a whole-number id; got ${String(id)}.`,
      );
    }
  });
  const ids = [...populationIds].sort((a, b) => a - b);
  const repeated = ids.find((id, i) => i > 0 && ids[i - 1] === id);
  if (repeated !== undefined) {
    throw new DomainError('populationIds', `The population lists id ${repeated} more than once.`);
  }
  if (!Number.isInteger(sampleSize) || sampleSize < 1 || sampleSize > ids.length) {
    throw new DomainError(
      'sampleSize',
      `The sample size must be a whole number from 1 to the population size (${ids.length}); ` +
        `got ${String(sampleSize)}.`,
    );
  }

  const random = seedrandom(seed);
  for (let i = 0; i < sampleSize; i++) {
    const j = i + Math.floor(random() * (ids.length - i));
    [ids[i], ids[j]] = [ids[j], ids[i]];
  }
  const drawOrder = ids.slice(0, sampleSize);
  return {
    seed,
    prng: SAMPLE_PRNG,
    drawOrder,
    sorted: [...drawOrder].sort((a, b) => a - b),
  };
}

interface RandomSource {
  getRandomValues<T extends ArrayBufferView>(array: T): T;
}

/**
 * A fresh seed such as "7f3a-09c2-e41b-5d80": 64 random bits, short enough to read aloud or copy
 * into a finding. It uses crypto.getRandomValues (Node 20, every browser) rather than randomUUID,
 * which browsers offer only on HTTPS pages.
 */
export function newSeed(): string {
  const source = (globalThis as { crypto?: RandomSource }).crypto;
  if (!source) throw new Error('No crypto.getRandomValues here to make a seed from.');
  const words = source.getRandomValues(new Uint16Array(4));
  return Array.from(words, (word) => word.toString(16).padStart(4, '0')).join('-');
}
