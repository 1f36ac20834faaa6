import type { Plan } from '@shared/planner';
import { CAUTIONS } from '@shared/planner/engineering';
import { formatDate, formatMoney } from '@/utils/format';
import { printColours } from './pdf-colours';
import { drawSheetLayout } from './pdf-sheet';
import { cuttingTable, fixingsTable, shoppingTable } from './pdf-tables';
import { PdfWriter } from './pdf-writer';

/** What goes on the PDF besides the plan itself. */
export interface PlanPdfOptions {
  title: string;
  format: (mm: number) => string;
  /** The unit the lengths are written in, in words. */
  unitName: string;
  /** Called as each part is written, 0 to 1, so the page can show progress. */
  onProgress?: (share: number) => void;
}

/** Let the page repaint between parts, so the progress shown moves. */
const breathe = () => new Promise<void>((resolve) => setTimeout(resolve, 0));

/**
 * The plan as a PDF to print or send to a builder: safety cautions first, then the summary, cutting list, shopping
 * list, sheet layouts drawn as vectors, fixings and the wiring caution. pdf-lib is loaded here, when a person asks
 * for the PDF, so its weight never slows the planner's first load. It uses the PDF standard fonts (Helvetica), which
 * every reader has built in: nothing to embed or download, at the cost of the WinAnsi character set (see `clean`).
 */
export async function buildPlanPdf(plan: Plan, options: PlanPdfOptions): Promise<Uint8Array> {
  const { PDFDocument, StandardFonts, rgb } = await import('pdf-lib');
  const doc = await PDFDocument.create();
  doc.setTitle(options.title);
  doc.setCreator('Benchwright frame planner');
  const fonts = {
    regular: await doc.embedFont(StandardFonts.Helvetica),
    bold: await doc.embedFont(StandardFonts.HelveticaBold),
  };
  const w = new PdfWriter(doc, fonts, printColours(rgb));
  const progress = async (share: number) => {
    options.onProgress?.(share);
    await breathe();
  };

  w.heading(options.title, 18);
  w.paragraph(`Frame plan from Benchwright, ${formatDate(new Date().toISOString())}. Lengths in ${options.unitName}.`);
  w.heading('Safety: read before you build', 13);
  for (const caution of plan.safety.cautions)
    w.paragraph(`- ${caution}`, { bold: caution === plan.safety.followLocalRules });

  w.heading('Summary', 13);
  w.paragraph(
    `${plan.boards.length} boards; ${plan.weight.totalKg.toFixed(1)} kg in all, the heaviest ${plan.weight.heaviestKg.toFixed(1)} kg.`,
  );
  if (plan.cost) w.paragraph(`Cost: ${formatMoney(plan.cost.totalMinor, plan.cost.currency)}.`, { bold: true });
  for (const warning of plan.warnings) w.paragraph(`! ${warning}`);
  await progress(0.2);

  const cutting = cuttingTable(plan, options.format);
  w.heading('Cutting list', 13);
  w.table(cutting.columns, cutting.rows);
  const shopping = shoppingTable(plan);
  w.heading('Shopping list', 13);
  w.table(shopping.columns, shopping.rows);
  await progress(0.45);

  w.heading('Sheet layouts', 13);
  w.paragraph(
    'Numbers on the dashed lines give the order of the saw cuts; hatched pieces are offcuts. Face grain runs left to right.',
  );
  for (const stock of plan.sheets) {
    stock.plan.sheets.forEach((layout, i) => {
      drawSheetLayout(
        w,
        layout,
        `${stock.materialName} ${stock.thicknessMm} mm, sheet ${i + 1} of ${stock.plan.sheetCount}`,
        options.format,
      );
    });
    for (const line of stock.yardCutList ?? []) w.paragraph(line, { size: 8 });
  }
  await progress(0.75);

  const fixings = fixingsTable(plan);
  w.heading('Fixings', 13);
  w.table(fixings.columns, fixings.rows);
  w.paragraph(plan.fixings.boardJoins.note);
  w.paragraph(
    `PVA wood glue: about ${Math.round(plan.fixings.glue.grams)} g (${plan.fixings.glue.bottles} x 1 kg bottle).`,
  );

  w.heading('Wiring', 13);
  w.paragraph(
    `${plan.wiring.system.toUpperCase()} bus of ${plan.wiring.conductorName}: ${plan.wiring.busWireM.toFixed(1)} m of bus wire, ${plan.wiring.dropperWireM.toFixed(1)} m of dropper wire; worst drop ${plan.wiring.worstDropV.toFixed(2)} V.`,
  );
  for (const c of CAUTIONS.filter((c) => c.id === 'mains' || c.id === 'low-voltage'))
    w.paragraph(c.text, { bold: true });
  w.paragraph(plan.safety.followLocalRules, { bold: true });

  const bytes = await doc.save();
  await progress(1);
  return bytes;
}
