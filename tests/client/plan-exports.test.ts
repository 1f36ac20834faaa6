import { computePlan, singlePortableModule } from '@shared/planner';
import { mount } from '@vue/test-utils';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import PlanExports from '@/components/planner/PlanExports.vue';

/** What the page handed to the browser to save: the file's name and contents. */
interface Download {
  name: string;
  blob: Blob;
}

describe('downloading the lists as CSV', () => {
  let downloads: Download[];
  let blobs: Map<string, Blob>;

  beforeEach(() => {
    downloads = [];
    blobs = new Map();
    vi.spyOn(URL, 'createObjectURL').mockImplementation((blob) => {
      const url = `blob:test/${blobs.size}`;
      blobs.set(url, blob as Blob);
      return url;
    });
    vi.spyOn(URL, 'revokeObjectURL').mockImplementation(() => undefined);
    // The link's click is where a browser would save the file: record it instead of navigating.
    vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (this: HTMLAnchorElement) {
      downloads.push({ name: this.download, blob: blobs.get(this.href)! });
    });
  });
  afterEach(() => {
    vi.restoreAllMocks();
    document.body.innerHTML = '';
  });

  async function press(label: string) {
    const plan = computePlan(singlePortableModule);
    const wrapper = mount(PlanExports, { props: { plan, name: 'Loft layout, v2' }, attachTo: document.body });
    const button = wrapper.findAll('button').find((b) => b.text() === label);
    await button!.trigger('click');
    return plan;
  }

  it('saves the cutting list as a CSV file named after the plan, one row per part', async () => {
    const plan = await press('Cutting list (CSV)');

    expect(downloads).toHaveLength(1);
    expect(downloads[0]!.name).toBe('loft-layout-v2-cutting-list.csv');
    expect(downloads[0]!.blob.type).toBe('text/csv;charset=utf-8');
    const text = await downloads[0]!.blob.text();
    const lines = text
      .replace(/^\uFEFF/, '')
      .trimEnd()
      .split('\r\n');
    expect(lines[0]).toBe('Part,Kind,Material,Section or thickness,Length (mm),Width (mm),Quantity,Boards');
    expect(lines).toHaveLength(plan.cuttingList.length + 1);
  });

  it('saves the shopping list with its supplier and price columns', async () => {
    const plan = await press('Shopping list (CSV)');

    expect(downloads[0]!.name).toBe('loft-layout-v2-shopping-list.csv');
    const text = (await downloads[0]!.blob.text()).replace(/^\uFEFF/, '');
    expect(text.split('\r\n')[0]).toBe(
      'Item key,Item,Quantity,Unit,Supplier,Unit price (minor units),Total (minor units)',
    );
    expect(text).toContain(plan.shoppingList[0]!.itemKey);
    expect(text).toContain('Materials total');
  });

  it('starts the file with a byte-order mark, so spreadsheets read × and ² as written', async () => {
    await press('Cutting list (CSV)');

    const bytes = new Uint8Array(await downloads[0]!.blob.arrayBuffer());
    expect([...bytes.slice(0, 3)]).toEqual([0xef, 0xbb, 0xbf]);
  });
});
