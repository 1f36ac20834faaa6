import { DEMO_ACCOUNTS } from './demo-accounts';

/** Printed by `npm start`: who you can sign in as in the demo scenario. */
console.log('Demo sign-ins (invented people; demo only):');
for (const a of DEMO_ACCOUNTS) {
  console.log(`  ${a.role.padEnd(9)} ${a.email.padEnd(36)} ${a.password.padEnd(28)} ${a.displayName}, who ${a.about}`);
}
