/**
 * The audit log's hash chain: pure functions, no framework (issue #8).
 *
 * Each sealed entry carries its place in the chain (`chainSeq`), the hash of the entry before it
 * (`prevHash`) and the SHA-256 of its own canonical form (`entryHash`), which includes `prevHash`.
 * Changing, removing or reordering a sealed entry therefore breaks a link that `ChainVerifier`
 * finds. The hashing function is passed in: core is also bundled into the web app, which must not
 * pull in Node's crypto (and never hashes).
 */

/** Hex SHA-256 of a UTF-8 string (the API passes one built on node:crypto). */
export type Sha256Hex = (text: string) => string;

/** The first entry's `prevHash`. */
export const GENESIS_HASH = '0'.repeat(64);

/** An audit entry's recorded content, as read back from the database. */
export interface ChainEntryContent {
  id: number;
  /** A Date, or an ISO instant. */
  occurredAt: Date | string;
  actorUserId: number | null;
  actorEmail: string | null;
  action: string;
  entityType: string;
  entityId: string | null;
  before: unknown;
  after: unknown;
  requestId: string | null;
  ip: string | null;
}

export interface ChainLink {
  chainSeq: number;
  prevHash: string;
  entryHash: string;
}

export type SealedChainEntry = ChainEntryContent & ChainLink;

/** The last sealed entry: where the next seal continues and where a verification ended. */
export interface ChainHead {
  chainSeq: number;
  entryHash: string;
}

/** Before the first entry: sequence 0 with the genesis hash, so the first seal gets 1. */
export const GENESIS_HEAD: ChainHead = { chainSeq: 0, entryHash: GENESIS_HASH };

/**
 * content-changed: the entry's recomputed hash differs from the stored one (a field was edited);
 * link-changed: the entry's own hash holds but it does not point at the entry before it (hashes
 * were rewritten); missing: a place in the chain has no entry (removed).
 */
export const CHAIN_BREAK_REASONS = ['content-changed', 'link-changed', 'missing'] as const;
export type ChainBreakReason = (typeof CHAIN_BREAK_REASONS)[number];

export interface ChainBreak {
  /** The chain position where the chain stops holding. */
  chainSeq: number;
  /** The entry at that position; null when the position has no entry (reason 'missing'). */
  entryId: number | null;
  reason: ChainBreakReason;
  /** Plain words for the auditor. */
  message: string;
}

/**
 * JSON with object keys sorted (by UTF-16 code unit) at every depth and no whitespace, so the
 * same value always gives the same text whatever order a driver returns keys in.
 */
export function canonicalJson(value: unknown): string {
  if (value === null || value === undefined) return 'null';
  if (typeof value === 'number') {
    if (!Number.isFinite(value)) throw new RangeError('a hashed number must be finite');
    return JSON.stringify(value);
  }
  if (typeof value === 'string' || typeof value === 'boolean') return JSON.stringify(value);
  if (value instanceof Date) return JSON.stringify(value.toISOString());
  if (Array.isArray(value)) return `[${value.map((item) => canonicalJson(item)).join(',')}]`;
  if (typeof value === 'object') {
    const record = value as Record<string, unknown>;
    const keys = Object.keys(record)
      .filter((key) => record[key] !== undefined)
      .sort();
    return `{${keys.map((key) => `${JSON.stringify(key)}:${canonicalJson(record[key])}`).join(',')}}`;
  }
  throw new RangeError(`a hashed value cannot be of type ${typeof value}`);
}

/** occurred_at as an ISO UTC instant with milliseconds (the column keeps milliseconds). */
function isoUtc(value: Date | string): string {
  const date = value instanceof Date ? value : new Date(value);
  if (Number.isNaN(date.getTime())) throw new RangeError('occurredAt is not a valid instant');
  return date.toISOString();
}

/**
 * The text that is hashed: a fixed list of fields in a fixed order, named as the columns are.
 * Changing this list or its order makes every stored hash fail, so it never changes in place.
 */
export function canonicalEntry(entry: ChainEntryContent & Omit<ChainLink, 'entryHash'>): string {
  const fields: [string, unknown][] = [
    ['id', entry.id],
    ['occurred_at', isoUtc(entry.occurredAt)],
    ['actor_user_id', entry.actorUserId],
    ['actor_email', entry.actorEmail],
    ['action', entry.action],
    ['entity_type', entry.entityType],
    ['entity_id', entry.entityId],
    ['before_json', entry.before],
    ['after_json', entry.after],
    ['request_id', entry.requestId],
    ['ip', entry.ip],
    ['chain_seq', entry.chainSeq],
    ['prev_hash', entry.prevHash],
  ];
  return `{${fields.map(([key, value]) => `${JSON.stringify(key)}:${canonicalJson(value)}`).join(',')}}`;
}

export function entryHashOf(
  entry: ChainEntryContent & Omit<ChainLink, 'entryHash'>,
  sha256: Sha256Hex,
): string {
  return sha256(canonicalEntry(entry));
}

/** Seals entries, in the order given, onto the chain after `head`. */
export function sealAfter(
  head: ChainHead,
  entries: readonly ChainEntryContent[],
  sha256: Sha256Hex,
): SealedChainEntry[] {
  const sealed: SealedChainEntry[] = [];
  let previous = head;
  for (const entry of entries) {
    const link = { chainSeq: previous.chainSeq + 1, prevHash: previous.entryHash };
    const entryHash = entryHashOf({ ...entry, ...link }, sha256);
    sealed.push({ ...entry, ...link, entryHash });
    previous = { chainSeq: link.chainSeq, entryHash };
  }
  return sealed;
}

/**
 * Walks the chain page by page (entries fed in chain order) and stops at the first broken link,
 * so a caller can stream the whole log without holding it in memory.
 */
export class ChainVerifier {
  private previous: ChainHead;
  private count = 0;
  private broken: ChainBreak | null = null;

  /**
   * `anchor`: the head an earlier verification recorded. The chain must still reach it with the
   * same hash; otherwise entries were cut from the end, or the chain was recomputed from some
   * entry on, which the links alone cannot show.
   */
  constructor(
    private readonly sha256: Sha256Hex,
    private readonly anchor: ChainHead | null = null,
  ) {
    this.previous = GENESIS_HEAD;
  }

  /** Entries checked so far (up to and including a broken one). */
  get entriesChecked(): number {
    return this.count;
  }

  /** The last entry that held. */
  get head(): ChainHead {
    return this.previous;
  }

  get firstBreak(): ChainBreak | null {
    return this.broken;
  }

  /** Checks the next entries; returns the first break found so far (later calls do nothing). */
  check(entries: readonly SealedChainEntry[]): ChainBreak | null {
    for (const entry of entries) {
      if (this.broken) break;
      this.broken = this.checkOne(entry);
      if (!this.broken) this.previous = { chainSeq: entry.chainSeq, entryHash: entry.entryHash };
    }
    return this.broken;
  }

  /** After the last page: the chain must reach at least as far as the anchor. */
  finish(): ChainBreak | null {
    const anchor = this.anchor;
    if (this.broken || !anchor || anchor.chainSeq <= this.previous.chainSeq) return this.broken;
    const missing = this.previous.chainSeq + 1;
    this.broken = {
      chainSeq: missing,
      entryId: null,
      reason: 'missing',
      message:
        `Entry #${missing} is missing: an earlier verification saw the chain reach ` +
        `#${anchor.chainSeq}, and it now ends at #${this.previous.chainSeq}.`,
    };
    return this.broken;
  }

  private checkOne(entry: SealedChainEntry): ChainBreak | null {
    this.count += 1;
    const expectedSeq = this.previous.chainSeq + 1;
    if (entry.chainSeq !== expectedSeq) {
      return {
        chainSeq: expectedSeq,
        entryId: null,
        reason: 'missing',
        message:
          `Entry #${expectedSeq} is missing: after #${this.previous.chainSeq} the chain ` +
          `continues at #${entry.chainSeq} (entry ${entry.id}).`,
      };
    }
    const recomputed = entryHashOf(entry, this.sha256);
    if (recomputed !== entry.entryHash) {
      return {
        chainSeq: entry.chainSeq,
        entryId: entry.id,
        reason: 'content-changed',
        message: `Entry #${entry.chainSeq} (entry ${entry.id}) was changed after it was sealed: its content no longer gives its stored hash.`,
      };
    }
    if (entry.prevHash !== this.previous.entryHash) {
      return {
        chainSeq: entry.chainSeq,
        entryId: entry.id,
        reason: 'link-changed',
        message: `Entry #${entry.chainSeq} (entry ${entry.id}) does not point at the entry before it: the chain was rewritten here.`,
      };
    }
    if (this.anchor?.chainSeq === entry.chainSeq && this.anchor.entryHash !== entry.entryHash) {
      return {
        chainSeq: entry.chainSeq,
        entryId: entry.id,
        reason: 'link-changed',
        message: `Entry #${entry.chainSeq} (entry ${entry.id}) has another hash than an earlier verification recorded: the chain was recomputed up to here.`,
      };
    }
    return null;
  }
}
