import { describe, expect, it } from 'vitest';
import { computePlan } from '../../../shared/planner/compute-plan';
import { csvCell, toCsv } from '../../../shared/planner/csv';
import { singlePortableModule } from '../../../shared/planner/examples';
import { cuttingListCsv, shoppingListCsv } from '../../../shared/planner/export-csv';

describe('CSV cells', () => {
  it('quote a cell holding a comma, a quote or a line break, doubling its quotes (RFC 4180)', () => {
    expect(csvCell('plain')).toBe('plain');
    expect(csvCell('a, b')).toBe('"a, b"');
    expect(csvCell('6" bolt')).toBe('"6"" bolt"');
    expect(csvCell('two\nlines')).toBe('"two\nlines"');
  });

  it('neutralise text a spreadsheet would run as a formula with a leading apostrophe (OWASP CSV injection)', () => {
    expect(csvCell('=1+1')).toBe("'=1+1");
    expect(csvCell('+44 1234')).toBe("'+44 1234");
    expect(csvCell('-2')).toBe("'-2");
    expect(csvCell('@SUM(A1)')).toBe("'@SUM(A1)");
    expect(csvCell('\tcmd')).toBe("'\tcmd");
    expect(csvCell('\rcmd')).toBe('"\'\rcmd"');
    expect(csvCell('=HYPERLINK("x")')).toBe('"\'=HYPERLINK(""x"")"');
  });

  it('write numbers as they are and end every line with CRLF (RFC 4180)', () => {
    expect(
      toCsv([
        ['a', 1],
        ['b', 2.5],
      ]),
    ).toBe('a,1\r\nb,2.5\r\n');
  });
});

describe('the cutting list and shopping list as CSV', () => {
  it('neutralise a board named like a formula wherever its name appears', () => {
    const plan = computePlan({ boards: [{ name: '=HYPERLINK("x")', lengthMm: 1200, widthMm: 600 }] });
    const csv = cuttingListCsv(plan);
    expect(csv).toContain('"\'=HYPERLINK(""x"") × 2"');
    expect(csv).not.toMatch(/(^|,)=HYPERLINK/m);
  });

  it('list one line per cutting-list row under a header', () => {
    const plan = computePlan(singlePortableModule);
    const lines = cuttingListCsv(plan).trimEnd().split('\r\n');
    expect(lines[0]).toBe('Part,Kind,Material,Section or thickness,Length (mm),Width (mm),Quantity,Boards');
    expect(lines).toHaveLength(plan.cuttingList.length + 1);
    expect(lines[1]).toBe('Side rail,side-rail,timber uk-2x1,44 × 18 mm,1200,,2,Portable module × 2');
  });

  it('give each item its supplier and prices in minor units, then delivery, cutting and the total', () => {
    const plan = computePlan(singlePortableModule);
    const lines = shoppingListCsv(plan).trimEnd().split('\r\n');
    expect(lines).toHaveLength(plan.shoppingList.length + 4);
    expect(lines.at(-1)).toBe(`,Materials total,,,,,${plan.cost!.materials!.totalMinor}`);
  });

  it('neutralise a supplier named like a formula', () => {
    const plan = computePlan({
      boards: [{ lengthMm: 1200, widthMm: 600 }],
      pricing: { suppliers: [{ name: '@evil', items: [{ itemKey: 'pva:bottle', priceMinor: 900 }] }] },
    });
    expect(shoppingListCsv(plan)).toContain(",'@evil,");
  });
});
