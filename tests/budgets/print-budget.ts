import { measureClientBuild } from './client-build';
import { budgetTable } from './route-sizes';

/** `npm run budget`: build the client, print each route's initial JS and CSS against its budget, fail when over. */
const sizes = await measureClientBuild();
console.log(budgetTable(sizes));
const over = sizes.flatMap((s) => s.overBudget);
if (over.length) {
  console.error(`\nOver budget:\n${over.join('\n')}`);
  process.exit(1);
}
console.log('\nEvery route is within its budget.');
