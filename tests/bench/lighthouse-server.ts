import { startDemoApp } from './lighthouse-app';

/**
 * The demo app in a process of its own, for `npm run lighthouse`: Lighthouse's own work (reading a trace of many
 * thousand events) then never holds up the app's answers, which would count against the page. Prints
 * `ready <url>` when listening; stops cleanly when its standard input closes or on SIGTERM.
 */
const app = await startDemoApp();
let stopping = false;
async function stop(): Promise<void> {
  if (stopping) return;
  stopping = true;
  await app.stop();
  process.exit(0);
}
process.stdin.on('close', () => void stop());
process.stdin.resume();
process.on('SIGTERM', () => void stop());
console.log(`ready ${app.url}`);
