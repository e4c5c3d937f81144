import type { ExportView } from '@tallyloom/core';
import { parse } from 'csv-parse/sync';
import { execFileSync } from 'node:child_process';
import { mkdtemp, readFile, readdir } from 'node:fs/promises';
import { join } from 'node:path';
import { QueryTypes } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import * as XLSX from 'xlsx';
import type { TestApp } from './test-app';

/** What the polling saw on the way to 'done'. */
export interface FinishedExport {
  view: ExportView;
  /** The progress of every poll, in order. */
  progress: number[];
}

/**
 * Posts an export and polls it like the web app does until it is finished (the job runs
 * in-process). Fails on any state other than 'done'.
 */
export async function exportFinished(
  testApp: TestApp,
  token: string,
  url: string,
  body: object,
): Promise<FinishedExport> {
  const response = await testApp
    .http()
    .post(url)
    .set('Authorization', `Bearer ${token}`)
    .send(body);
  if (response.status !== 202)
    throw new Error(`${url} answered ${response.status}: ${JSON.stringify(response.body)}`);
  let view = response.body as ExportView;
  const progress = [view.progress];
  for (let i = 0; i < 1200 && (view.state === 'queued' || view.state === 'running'); i += 1) {
    await new Promise((resolve) => setTimeout(resolve, 100));
    view = (
      await testApp.http().get(`/api/exports/${view.id}`).set('Authorization', `Bearer ${token}`)
    ).body as ExportView;
    progress.push(view.progress);
  }
  if (view.state !== 'done') throw new Error(`export ended ${view.state}: ${view.error ?? ''}`);
  return { view, progress };
}

/** Follows the signed link without the sign-in header, as a browser does. */
export async function downloadExport(testApp: TestApp, view: ExportView): Promise<Buffer> {
  const response = await testApp
    .http()
    .get(view.downloadUrl!)
    .buffer(true)
    .parse((res, callback) => {
      const chunks: Buffer[] = [];
      res.on('data', (chunk: Buffer) => chunks.push(chunk));
      res.on('end', () => callback(null, Buffer.concat(chunks)));
    });
  if (response.status !== 200) throw new Error(`download answered ${response.status}`);
  return response.body as Buffer;
}

/** One sheet of a downloaded table, read with SheetJS (never the exceljs that wrote it). */
export interface SheetTable {
  headers: string[];
  rows: Array<Record<string, unknown>>;
  /** The totals row under the data, or null when the table has none. */
  totals: Record<string, unknown> | null;
}

export function sheetTable(book: XLSX.WorkBook, name: string): SheetTable {
  const sheet = book.Sheets[name];
  if (!sheet) throw new Error(`no sheet ${name} in ${book.SheetNames.join(', ')}`);
  const headers = XLSX.utils.sheet_to_json<string[]>(sheet, { header: 1 })[0];
  const rows = XLSX.utils.sheet_to_json<Record<string, unknown>>(sheet, {
    raw: true,
    defval: null,
  });
  const last = rows.at(-1);
  const totals = last && last[headers[0]] === 'Total' ? rows.pop()! : null;
  return { headers, rows, totals };
}

export function readBook(bytes: Buffer): XLSX.WorkBook {
  return XLSX.read(bytes, { type: 'buffer', cellDates: true });
}

/** Every cell of every sheet as text, for scans of what a file must never hold. */
export function everyCell(book: XLSX.WorkBook): string[] {
  return book.SheetNames.flatMap((name) =>
    XLSX.utils
      .sheet_to_json<unknown[]>(book.Sheets[name], { header: 1, raw: false, defval: '' })
      .flat()
      .map((cell) => String(cell)),
  );
}

/** A CSV download as records keyed by header (csv-parse, a reader independent of the writer). */
export function csvRecords(bytes: Buffer): Array<Record<string, string>> {
  return parse(bytes, { bom: true, columns: true }) as Array<Record<string, string>>;
}

/**
 * Opens the file in LibreOffice headless and converts its first sheet to CSV: proof that a real
 * spreadsheet program reads it (and recalculates its formulas). Returns the CSV's records.
 */
export async function libreOfficeCsv(file: string, dir: string): Promise<string[][]> {
  const out = await mkdtemp(join(dir, 'lo-out-'));
  execFileSync(
    'libreoffice',
    [
      `-env:UserInstallation=file://${join(dir, 'lo-profile')}`,
      '--headless',
      '--convert-to',
      'csv',
      '--outdir',
      out,
      file,
    ],
    { stdio: 'pipe', timeout: 120_000 },
  );
  const [converted] = await readdir(out);
  return parse(await readFile(join(out, converted), 'utf8'), {
    relax_column_count: true,
  }) as string[][];
}

/**
 * Waits for the snapshots of a fiscal year that the first test app's initial full rebuild writes
 * (in one transaction). Suites that compare exports with dashboards wait rather than rebuild:
 * a rebuild of their own would move the "as of" under other suites' feet.
 */
export async function snapshotsBuilt(sequelize: Sequelize, periodKey: string): Promise<void> {
  for (let i = 0; i < 600; i += 1) {
    const [row] = await sequelize.query<{ n: number }>(
      "SELECT COUNT(*) AS n FROM report_snapshots WHERE scope = 'network' AND period_kind = 'fiscal_year' AND period_key = ?",
      { replacements: [periodKey], type: QueryTypes.SELECT },
    );
    if (Number(row.n) > 0) return;
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
  throw new Error(`no snapshots of ${periodKey} were built`);
}
