import { createHash } from 'node:crypto';
import { mkdir, writeFile } from 'node:fs/promises';
import { dirname } from 'node:path';
import { PNG } from 'pngjs';
import { QueryTypes, type Sequelize } from 'sequelize';
import {
  DEFAULT_UPLOADS_DIR,
  newStorageKey,
  pathForKey,
} from '../../services/api/src/storage/storage-layout';
import { inBatches } from './bulk-insert';
import { between, chance, mulberry32, pick, type Random } from './demo-random';

/**
 * The demo history runs from here (or a chapter's start, if later) to yesterday, so a demo seeded
 * in a later month still has parcels behind every month its tallies cover.
 */
const HISTORY_FROM = '2024-10-01';
const HISTORY_TO = new Date(Date.now() - 24 * 60 * 60 * 1000).toISOString().slice(0, 10);

// Invented makers at reserved example domains.
const FIRST_NAMES = [
  'Maren',
  'Odile',
  'Teodor',
  'Ysolde',
  'Bram',
  'Linnea',
  'Caspian',
  'Wrenna',
  'Alaric',
  'Posy',
  'Ezra',
  'Hollis',
  'Saoirse',
  'Ilse',
  'Tobiah',
  'Juno',
  'Fenna',
  'Rook',
  'Calla',
  'Anselm',
];
const LAST_NAMES = [
  'Thistlewood',
  'Quenby',
  'Marchbank',
  'Oakhart',
  'Penhallow',
  'Dunstable',
  'Fairweather',
  'Greaves',
  'Holloway',
  'Kettering',
  'Lovell',
  'Mossop',
  'Ninian',
  'Pellow',
  'Redfern',
  'Stowe',
];
const STREETS = [
  'Wool Lane',
  'Bobbin Row',
  'Spindle Way',
  'Carder Street',
  'Loom Court',
  'Fleece Road',
];
const TOWNS = ['Alder Falls', 'Brindle Bay', 'Cedar Hollow', 'Dunmore', 'Fernwick', 'Larkspur'];
const OTHER_REASONS = [
  'Crocheted with loose fringe; not safe to sew in',
  'Panel knitted in novelty eyelash yarn',
  'Felted in the wash by the sender',
  'Wrong shape: triangles for a shawl',
];
const NOTES = [
  'Parcel arrived with a thank-you card.',
  'Box damp at one corner; panels dried before counting.',
  'Sender asked for a receipt by post.',
  'Packed with spare yarn, added to the stash.',
  'Second parcel from this knitting circle this month.',
];

interface ChapterRow {
  id: number;
  region_id: number;
  active_from: string;
  active_to: string | null;
}
interface CampaignRow {
  id: number;
  code: string;
  starts_on: string;
  ends_on: string;
  region_id: number | null;
}

/** A small label-like picture: a coloured band, lines of "text", a barcode; each seed its own. */
export function labelPng(seed: number): Buffer {
  const random = mulberry32(seed);
  const width = 160;
  const height = 100;
  const png = new PNG({ width, height });
  const hue = random() * 360;
  const band = hslToRgb(hue, 0.55, 0.45);
  const paper = hslToRgb((hue + 40) % 360, 0.35, 0.95);
  const set = (x: number, y: number, [r, g, b]: [number, number, number]) => {
    const i = (y * width + x) * 4;
    png.data[i] = r;
    png.data[i + 1] = g;
    png.data[i + 2] = b;
    png.data[i + 3] = 255;
  };
  for (let y = 0; y < height; y++) for (let x = 0; x < width; x++) set(x, y, y < 18 ? band : paper);
  const ink: [number, number, number] = [40, 40, 48];
  for (let line = 0; line < 4; line++) {
    const y0 = 26 + line * 10;
    const length = between(random, 60, 140);
    for (let y = y0; y < y0 + 4; y++) for (let x = 10; x < 10 + length; x++) set(x, y, ink);
  }
  for (let x = 10; x < 150;) {
    const bar = between(random, 1, 3);
    for (let y = 70; y < 92; y++)
      for (let dx = 0; dx < bar && x + dx < 150; dx++) set(x + dx, y, ink);
    x += bar + between(random, 1, 3);
  }
  return PNG.sync.write(png);
}

function hslToRgb(h: number, s: number, l: number): [number, number, number] {
  const k = (n: number) => (n + h / 30) % 12;
  const a = s * Math.min(l, 1 - l);
  const f = (n: number) => l - a * Math.max(-1, Math.min(k(n) - 3, Math.min(9 - k(n), 1)));
  return [Math.round(f(0) * 255), Math.round(f(8) * 255), Math.round(f(4) * 255)];
}

function lastDayOf(year: number, month: number): number {
  return new Date(Date.UTC(year, month, 0)).getUTCDate();
}

const iso = (year: number, month: number, day: number) =>
  `${year}-${String(month).padStart(2, '0')}-${String(day).padStart(2, '0')}`;

function mistype(code: string, random: Random): string {
  const variants = [
    code.split('').reverse().join(''),
    `${code.slice(0, -1)}${(Number(code.slice(-1)) + 1) % 10}`,
    code.slice(1),
    `${code.slice(0, 2)}-${code.slice(2)}`,
  ];
  const chosen = pick(random, variants);
  return chosen.toUpperCase() === code.toUpperCase() ? `${code}X` : chosen;
}

/** Two years of parcel receipts for the demo network, some with generated scans. */
export async function seedReceipts(sequelize: Sequelize): Promise<void> {
  const select = <T extends object>(sql: string) =>
    sequelize.query<T>(sql, { type: QueryTypes.SELECT });
  const chapters = await select<ChapterRow>(
    'SELECT id, region_id, active_from, active_to FROM chapters ORDER BY id',
  );
  const campaigns = await select<CampaignRow>(
    'SELECT id, code, starts_on, ends_on, region_id FROM campaigns ORDER BY id',
  );
  const sizeIds = (
    await select<{ id: number }>(
      'SELECT id FROM blanket_sizes WHERE active = 1 ORDER BY sort_order, id',
    )
  ).map((row) => row.id);
  const leads = new Map(
    (
      await select<{ id: number; chapter_id: number }>(
        "SELECT id, chapter_id FROM users WHERE role = 'chapter_lead' AND chapter_id IS NOT NULL",
      )
    ).map((row) => [row.chapter_id, row.id]),
  );
  const [{ next }] = await select<{ next: number }>(
    'SELECT COALESCE(MAX(id), 0) + 1 AS next FROM parcel_receipts',
  );
  const uploadsDir = process.env.UPLOADS_DIR ?? DEFAULT_UPLOADS_DIR;

  const receipts: object[] = [];
  const finished: object[] = [];
  const scans: object[] = [];
  const files: Array<{ key: string; content: Buffer }> = [];
  let id = Number(next);

  for (const chapter of chapters) {
    const random = mulberry32(chapter.id * 7919);
    const from = [dateOnly(chapter.active_from), HISTORY_FROM].sort()[1];
    const to = [dateOnly(chapter.active_to) ?? HISTORY_TO, HISTORY_TO].sort()[0];
    // Some chapters are busier than others, all year round.
    const busyness = 0.6 + random() * 0.9;
    let [year, month] = from.split('-').map(Number);
    while (iso(year, month, 1) <= to) {
      const parcels = between(random, 4, 12);
      const days: string[] = [];
      for (let n = 0; n < parcels; n++) {
        const day = iso(year, month, between(random, 1, lastDayOf(year, month)));
        if (day >= from && day <= to) days.push(day);
      }
      for (const receivedOn of days.sort()) {
        const row = receiptRow(id, chapter, receivedOn, random, busyness, campaigns, leads);
        receipts.push(row);
        if (sizeIds.length > 0 && chance(random, 0.07)) {
          const sizes = [...sizeIds].sort(() => random() - 0.5).slice(0, between(random, 1, 2));
          for (const blanketSizeId of sizes) {
            finished.push({
              receipt_id: id,
              blanket_size_id: blanketSizeId,
              count: between(random, 1, 3),
            });
          }
        }
        if (chance(random, 1 / 15)) {
          const content = labelPng(id);
          // Derived from the receipt, so seeding again writes the same files, not new ones.
          const key = newStorageKey(createHash('sha256').update(`demo-scan-${id}`).digest());
          files.push({ key, content });
          scans.push({
            receipt_id: id,
            storage_key: key,
            display_name: `label-${receivedOn}-${id}.png`,
            media_type: 'image/png',
            size_bytes: content.length,
            sha256: createHash('sha256').update(content).digest('hex'),
            uploaded_by: row.created_by,
            created_at: row.created_at,
          });
        }
        id++;
      }
      [year, month] = month === 12 ? [year + 1, 1] : [year, month + 1];
    }
  }

  for (const file of files) {
    const path = pathForKey(uploadsDir, file.key);
    await mkdir(dirname(path), { recursive: true });
    await writeFile(path, file.content);
  }
  await sequelize.transaction(async (transaction) => {
    await inBatches(sequelize, 'parcel_receipts', receipts, transaction);
    await inBatches(sequelize, 'receipt_finished_blankets', finished, transaction);
    await inBatches(sequelize, 'receipt_scans', scans, transaction);
  });
}

/** DATEONLY comes back as text or a Date, depending on the driver. */
function dateOnly(value: string | Date): string;
function dateOnly(value: string | Date | null): string | null;
function dateOnly(value: string | Date | null): string | null {
  if (value === null) return null;
  return typeof value === 'string' ? value.slice(0, 10) : value.toISOString().slice(0, 10);
}

function receiptRow(
  id: number,
  chapter: ChapterRow,
  receivedOn: string,
  random: Random,
  busyness: number,
  campaigns: CampaignRow[],
  leads: Map<number, number>,
) {
  const big = chance(random, 0.06);
  const panelsAccepted = Math.round(
    (big ? between(random, 90, 240) : between(random, 4, 60)) * busyness,
  );
  const setAside = chance(random, 0.22);
  const other = setAside && chance(random, 0.2) ? between(random, 1, 3) : 0;
  const withSender = chance(random, 0.4);
  const first = pick(random, FIRST_NAMES);
  const last = pick(random, LAST_NAMES);
  const running = campaigns.filter(
    (c) =>
      dateOnly(c.starts_on) <= receivedOn &&
      dateOnly(c.ends_on) >= receivedOn &&
      (c.region_id === null || c.region_id === chapter.region_id),
  );
  let campaignId: number | null = null;
  let code: string | null = null;
  // About a quarter of the parcels sent while a drive runs name it: drives land near their goals.
  if (running.length > 0 && chance(random, 0.25)) {
    const campaign = pick(random, running);
    if (chance(random, 0.06)) code = mistype(campaign.code, random);
    else {
      campaignId = campaign.id;
      code = chance(random, 0.15) ? campaign.code.toLowerCase() : campaign.code;
    }
  }
  const sample = chance(random, 0.1);
  const inCm = chance(random, 0.4);
  const side = (target: number) => {
    const inches = target + (random() - 0.5) * (chance(random, 0.2) ? 2.4 : 0.8);
    return Number((inCm ? inches * 2.54 : inches).toFixed(2));
  };
  const createdAt = new Date(
    `${receivedOn}T${String(between(random, 9, 19)).padStart(2, '0')}:15:00Z`,
  );
  return {
    id,
    chapter_id: chapter.id,
    received_on: receivedOn,
    sender_name: withSender && chance(random, 0.9) ? `${first} ${last}` : null,
    sender_email:
      withSender && chance(random, 0.7)
        ? `${first}.${last}@${pick(random, ['example.org', 'example.com'])}`.toLowerCase()
        : null,
    sender_address:
      withSender && chance(random, 0.5)
        ? `${between(random, 1, 240)} ${pick(random, STREETS)}, ${pick(random, TOWNS)}`
        : null,
    campaign_id: campaignId,
    campaign_code_entered: code,
    panels_accepted: panelsAccepted,
    set_aside_off_size: setAside && chance(random, 0.6) ? between(random, 1, 5) : 0,
    set_aside_hard_care: setAside && chance(random, 0.35) ? between(random, 1, 4) : 0,
    set_aside_soiled: setAside && chance(random, 0.25) ? between(random, 1, 2) : 0,
    set_aside_other: other,
    set_aside_other_note: other > 0 ? pick(random, OTHER_REASONS) : null,
    other_items: chance(random, 0.1) ? between(random, 1, 6) : 0,
    notes: chance(random, 0.08) ? pick(random, NOTES) : null,
    sample_width: sample ? side(7) : null,
    sample_height: sample ? side(9) : null,
    sample_unit: sample ? (inCm ? 'cm' : 'in') : null,
    created_by: leads.get(chapter.id) ?? null,
    version: 1,
    created_at: createdAt,
    updated_at: createdAt,
  };
}
