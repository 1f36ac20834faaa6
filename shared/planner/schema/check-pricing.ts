import type { CheckContext, FieldProblem } from './check-context';

/** Problems with the suppliers: two of one name, or one item priced twice by the same supplier. */
export function pricingProblems(ctx: CheckContext): FieldProblem[] {
  const suppliers = ctx.input.pricing?.suppliers ?? [];
  const problems: FieldProblem[] = [];
  const names = new Set<string>();
  suppliers.forEach((supplier, i) => {
    if (names.has(supplier.name)) {
      const message = `Supplier "${supplier.name}" is listed twice; merge the two or rename one.`;
      problems.push({ path: ['pricing', 'suppliers', i, 'name'], message });
    }
    names.add(supplier.name);
    const keys = new Set<string>();
    supplier.items.forEach((item, j) => {
      if (keys.has(item.itemKey)) {
        const message = `This item is priced twice by ${supplier.name}; keep one price.`;
        problems.push({ path: ['pricing', 'suppliers', i, 'items', j, 'itemKey'], message });
      }
      keys.add(item.itemKey);
    });
  });
  return problems;
}
