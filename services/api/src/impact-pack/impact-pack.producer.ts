import { Injectable } from '@nestjs/common';
import type { ImpactPackRequest } from '@tallyloom/core';
import type { ExportProducer, ExportResult, ExportRun } from '../exports/export-producer';
import { impactCharts } from './charts/impact-charts';
import { ImpactPackDataService } from './impact-pack-data.service';
import { buildImpactWorkbook } from './workbook/impact-workbook';

/**
 * The grant writer's impact pack: one small xlsx workbook (a normal, non-streaming exceljs
 * workbook: a few hundred rows at most) with figures, charts, methodology and data dictionary.
 */
@Injectable()
export class ImpactPackProducer implements ExportProducer<ImpactPackRequest> {
  constructor(private readonly data: ImpactPackDataService) {}

  async produce(params: ImpactPackRequest, run: ExportRun): Promise<ExportResult> {
    const data = await this.data.gather(params, run.actor);
    await run.progress(20);
    const charts = impactCharts(data);
    await run.progress(35);
    // Sheets fill 35–90%; writing the file is the rest.
    const { workbook, rows } = await buildImpactWorkbook(data, charts, (share) =>
      run.progress(Math.round(35 + share * 55)),
    );
    await workbook.xlsx.writeFile(run.filePath);
    await run.progress(100);
    return { rows, sheets: workbook.worksheets.length };
  }
}
