import { cuttingListCsv, shoppingListCsv, type Plan } from '@shared/planner';
import { ref, type Ref } from 'vue';
import { downloadBlob, fileSlug } from '@/utils/download';
import { useLengthUnit } from './useLengthUnit';

/** Spreadsheets read a UTF-8 CSV as such (×, ², £) only when it starts with a byte-order mark. */
const BOM = '\uFEFF';

/**
 * The plan's downloads: cutting list and shopping list as CSV (written by the planner library, formula-safe), and the
 * whole plan as a PDF, whose code is fetched only when asked for. `pdfProgress` runs 0 to 100 while it is built.
 */
export function usePlanExports(plan: Ref<Plan | null>, name: Ref<string>) {
  const { unit, formatLength } = useLengthUnit();
  const pdfBusy = ref(false);
  const pdfProgress = ref(0);
  const pdfError = ref('');

  function csv(kind: 'cutting-list' | 'shopping-list'): void {
    if (!plan.value) return;
    const text = kind === 'cutting-list' ? cuttingListCsv(plan.value) : shoppingListCsv(plan.value);
    downloadBlob(new Blob([BOM, text], { type: 'text/csv;charset=utf-8' }), `${fileSlug(name.value)}-${kind}.csv`);
  }

  async function pdf(): Promise<void> {
    if (!plan.value || pdfBusy.value) return;
    pdfBusy.value = true;
    pdfProgress.value = 0;
    pdfError.value = '';
    try {
      const { buildPlanPdf } = await import('@/utils/plan-pdf/plan-pdf');
      pdfProgress.value = 10;
      const bytes = await buildPlanPdf(plan.value, {
        title: name.value || 'Baseboard plan',
        format: (mm) => formatLength(mm),
        unitName: unit.value === 'mm' ? 'millimetres' : 'feet and inches',
        onProgress: (share) => {
          pdfProgress.value = Math.round(10 + share * 90);
        },
      });
      downloadBlob(new Blob([bytes as BlobPart], { type: 'application/pdf' }), `${fileSlug(name.value)}.pdf`);
    } catch (error) {
      console.error(error);
      pdfError.value = 'The PDF could not be made. Check your connection and try again.';
    } finally {
      pdfBusy.value = false;
    }
  }

  return { csv, pdf, pdfBusy, pdfProgress, pdfError };
}
