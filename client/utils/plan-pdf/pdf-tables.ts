import type { Plan } from '@shared/planner';
import { formatMoney } from '@/utils/format';
import { boardsTaking, materialName } from '@/utils/planner/material-names';
import type { PdfColumn } from './pdf-writer';

type Format = (mm: number) => string;

/** A table for the PDF: its columns and its rows of text. */
export interface PdfTable {
  columns: PdfColumn[];
  rows: string[][];
}

export function cuttingTable(plan: Plan, format: Format): PdfTable {
  return {
    columns: [
      { title: 'Part', share: 3 },
      { title: 'Cut from', share: 3.4 },
      { title: 'Length', share: 1.6 },
      { title: 'Width', share: 1.4 },
      { title: 'Qty', share: 0.8 },
      { title: 'For', share: 3.2 },
    ],
    rows: plan.cuttingList.map((row) => [
      row.name,
      materialName(row.material),
      format(row.lengthMm),
      row.widthMm === undefined ? '-' : format(row.widthMm),
      String(row.quantity),
      boardsTaking(row),
    ]),
  };
}

export function shoppingTable(plan: Plan): PdfTable {
  const currency = plan.cost?.currency ?? 'GBP';
  const lines = new Map((plan.cost?.materials?.lines ?? []).map((l) => [l.itemKey, l]));
  const priced = plan.cost?.materials !== null && plan.cost?.materials !== undefined;
  return {
    columns: [
      { title: 'Item', share: 6 },
      { title: 'Qty', share: 1 },
      ...(priced
        ? [
            { title: 'From', share: 3 },
            { title: 'Total', share: 1.6 },
          ]
        : []),
    ],
    rows: plan.shoppingList.map((item) => {
      const line = lines.get(item.itemKey);
      const money = line?.supplier ? formatMoney(line.totalMinor, currency) : 'no price';
      return [item.description, String(item.quantity), ...(priced ? [line?.supplier ?? '-', money] : [])];
    }),
  };
}

export function fixingsTable(plan: Plan): PdfTable {
  const mm = (value: number) => `${+value.toFixed(1)}`;
  return {
    columns: [
      { title: 'Joint', share: 4.5 },
      { title: 'Screw (mm)', share: 1.6 },
      { title: 'Pilot (mm)', share: 1.1 },
      { title: 'Clearance (mm)', share: 1.5 },
      { title: 'Countersink (mm)', share: 1.7 },
      { title: 'Each', share: 0.9 },
      { title: 'Total', share: 1 },
    ],
    rows: plan.fixings.screws.map((row) => {
      const s = row.screw;
      const drill = s
        ? [`${s.gaugeMm} x ${s.lengthMm}`, mm(s.pilotMm), mm(s.clearanceMm), mm(s.countersinkMm)]
        : [row.problem ?? 'See maker', '', '', ''];
      return [row.description, ...drill, String(row.perJoint), String(row.total)];
    }),
  };
}
