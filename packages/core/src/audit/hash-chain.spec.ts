import { createHash } from 'node:crypto';
import {
  ChainVerifier,
  GENESIS_HASH,
  GENESIS_HEAD,
  canonicalEntry,
  canonicalJson,
  entryHashOf,
  sealAfter,
  type ChainEntryContent,
  type ChainHead,
  type SealedChainEntry,
} from './hash-chain';

// The API passes the same function built on node:crypto (services/api/src/audit/sha256.ts).
const sha256 = (text: string) => createHash('sha256').update(text, 'utf8').digest('hex');

function entry(id: number, overrides: Partial<ChainEntryContent> = {}): ChainEntryContent {
  return {
    id,
    occurredAt: new Date(Date.UTC(2026, 11, 2, 9, 30, id % 60, 125)),
    actorUserId: 7,
    actorEmail: 'lead.alderfalls@emberfold.example',
    action: 'receipt.created',
    entityType: 'parcel_receipt',
    entityId: String(100 + id),
    before: null,
    after: { panelsAccepted: id, chapterId: 3 },
    requestId: `req-${id}`,
    ip: '127.0.0.1',
    ...overrides,
  };
}

const chainOf = (count: number) =>
  sealAfter(
    GENESIS_HEAD,
    Array.from({ length: count }, (_, i) => entry(i + 1)),
    sha256,
  );

describe('SHA-256 as the chain uses it', () => {
  it('gives the published digests', () => {
    // Source: FIPS 180-2, Appendix B.1 (one-block message "abc").
    expect(sha256('abc')).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
    // Source: FIPS 180-2, Appendix B.2 (multi-block message).
    expect(sha256('abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq')).toBe(
      '248d6a61d20638b8e5c026930c3e6039a33ce45964ff2167f6ecedd419db06c1',
    );
  });

  it('starts the chain from 64 zeros', () => {
    expect(GENESIS_HASH).toMatch(/^0{64}$/);
  });
});

describe('canonicalJson', () => {
  it('sorts keys at every depth and drops whitespace', () => {
    expect(canonicalJson({ b: 1, a: { d: [3, { z: true, y: null }], c: 'x' } })).toBe(
      '{"a":{"c":"x","d":[3,{"y":null,"z":true}]},"b":1}',
    );
  });

  it('gives one text for the same value whatever the key order', () => {
    expect(canonicalJson({ x: 1, y: 2 })).toBe(canonicalJson({ y: 2, x: 1 }));
  });

  it('refuses values JSON cannot carry', () => {
    expect(() => canonicalJson(Number.NaN)).toThrow(RangeError);
    expect(() => canonicalJson(() => 1)).toThrow(RangeError);
  });
});

describe('canonicalEntry', () => {
  it('writes the fixed field list in the fixed order, dates as ISO UTC', () => {
    const text = canonicalEntry({
      ...entry(5, { after: { z: 1, a: 'é' }, ip: null }),
      chainSeq: 12,
      prevHash: GENESIS_HASH,
    });
    expect(text).toBe(
      '{"id":5,"occurred_at":"2026-12-02T09:30:05.125Z","actor_user_id":7,' +
        '"actor_email":"lead.alderfalls@emberfold.example","action":"receipt.created",' +
        '"entity_type":"parcel_receipt","entity_id":"105","before_json":null,' +
        `"after_json":{"a":"é","z":1},"request_id":"req-5","ip":null,"chain_seq":12,` +
        `"prev_hash":"${GENESIS_HASH}"}`,
    );
  });

  it('reads an ISO string and a Date for the same instant alike', () => {
    const link = { chainSeq: 1, prevHash: GENESIS_HASH };
    const asDate = entry(1);
    const asText = { ...asDate, occurredAt: (asDate.occurredAt as Date).toISOString() };
    expect(canonicalEntry({ ...asText, ...link })).toBe(canonicalEntry({ ...asDate, ...link }));
  });
});

describe('sealAfter', () => {
  it('numbers entries on from the head and links each to the one before', () => {
    const sealed = chainOf(3);
    expect(sealed.map((e) => e.chainSeq)).toEqual([1, 2, 3]);
    expect(sealed[0].prevHash).toBe(GENESIS_HASH);
    expect(sealed[1].prevHash).toBe(sealed[0].entryHash);
    expect(sealed[2].prevHash).toBe(sealed[1].entryHash);
    expect(sealed[0].entryHash).toBe(
      sha256(canonicalEntry({ ...entry(1), chainSeq: 1, prevHash: GENESIS_HASH })),
    );
  });

  it('continues a chain from its stored head', () => {
    const first = chainOf(2);
    const head = { chainSeq: 2, entryHash: first[1].entryHash };
    const [next] = sealAfter(head, [entry(3)], sha256);
    expect(next).toMatchObject({ chainSeq: 3, prevHash: first[1].entryHash });
    expect(next.entryHash).toBe(chainOf(3)[2].entryHash);
  });
});

describe('ChainVerifier', () => {
  const verify = (entries: SealedChainEntry[], pageSize = 2, anchor: ChainHead | null = null) => {
    const verifier = new ChainVerifier(sha256, anchor);
    for (let i = 0; i < entries.length; i += pageSize) {
      if (verifier.check(entries.slice(i, i + pageSize))) break;
    }
    return verifier;
  };

  it('accepts an untouched chain fed page by page', () => {
    const verifier = verify(chainOf(7), 3);
    expect(verifier.firstBreak).toBeNull();
    expect(verifier.entriesChecked).toBe(7);
    expect(verifier.head.chainSeq).toBe(7);
  });

  it('finds a changed field at the changed entry', () => {
    const chain = chainOf(6);
    chain[3] = { ...chain[3], action: 'receipt.deleted' };
    const verifier = verify(chain);
    expect(verifier.firstBreak).toMatchObject({
      chainSeq: 4,
      entryId: 4,
      reason: 'content-changed',
    });
    expect(verifier.entriesChecked).toBe(4);
  });

  it('finds a changed JSON value deep inside after_json', () => {
    const chain = chainOf(4);
    chain[1] = { ...chain[1], after: { panelsAccepted: 999, chapterId: 3 } };
    expect(verify(chain).firstBreak).toMatchObject({ chainSeq: 2, reason: 'content-changed' });
  });

  it('finds a removed entry at its place in the chain', () => {
    const chain = chainOf(6);
    chain.splice(2, 1);
    expect(verify(chain).firstBreak).toMatchObject({
      chainSeq: 3,
      entryId: null,
      reason: 'missing',
    });
  });

  it('finds two entries that swapped places at the first of them', () => {
    const chain = chainOf(6);
    // Each keeps its content, but takes the other's place and links.
    const swapped = chain.map((e) => ({ ...e }));
    const link = (e: SealedChainEntry) => ({
      chainSeq: e.chainSeq,
      prevHash: e.prevHash,
      entryHash: e.entryHash,
    });
    Object.assign(swapped[1], link(chain[4]));
    Object.assign(swapped[4], link(chain[1]));
    swapped.sort((a, b) => a.chainSeq - b.chainSeq);
    expect(verify(swapped).firstBreak).toMatchObject({
      chainSeq: 2,
      entryId: 5,
      reason: 'content-changed',
    });
  });

  it('finds a rewritten entry whose own hash was recomputed, at the entry after it', () => {
    const chain = chainOf(5);
    const edited = { ...chain[1], action: 'receipt.rewritten' };
    chain[1] = { ...edited, entryHash: entryHashOf(edited, sha256) };
    expect(verify(chain).firstBreak).toMatchObject({
      chainSeq: 3,
      entryId: 3,
      reason: 'link-changed',
    });
  });

  it('finds entries removed from the end against an earlier verification', () => {
    const chain = chainOf(5);
    const verifier = verify(chain.slice(0, 3), 2, { chainSeq: 5, entryHash: chain[4].entryHash });
    expect(verifier.finish()).toMatchObject({
      chainSeq: 4,
      entryId: null,
      reason: 'missing',
    });
  });

  it('accepts a chain that reached as far as the earlier verification', () => {
    const chain = chainOf(5);
    const verifier = verify(chain, 2, { chainSeq: 4, entryHash: chain[3].entryHash });
    expect(verifier.finish()).toBeNull();
    expect(verifier.entriesChecked).toBe(5);
  });

  it("finds a chain recomputed from some entry on, at the earlier verification's head", () => {
    const chain = chainOf(5);
    const anchor = { chainSeq: 4, entryHash: chain[3].entryHash };
    // Entry 2 edited, and every hash from it on recomputed: the links all hold again.
    const rewritten = [
      ...chain.slice(0, 1),
      ...sealAfter(
        { chainSeq: 1, entryHash: chain[0].entryHash },
        [{ ...chain[1], action: 'receipt.rewritten' }, ...chain.slice(2)],
        sha256,
      ),
    ];
    expect(verify(rewritten, 2, anchor).firstBreak).toMatchObject({
      chainSeq: 4,
      entryId: 4,
      reason: 'link-changed',
    });
  });
});
