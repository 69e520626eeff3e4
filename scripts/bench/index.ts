/** `npm run bench`: prints figures; never part of the test suite's pass or fail. Needs `npm run build` first. */
import { existsSync } from 'node:fs';
import { benchBundle } from './bundle.js';
import { benchFanout } from './fanout.js';
import { benchJournal } from './journal.js';
import { benchRenders } from './renders.js';
import { SERVER_MAIN } from './support.js';
import { benchTimers } from './timers.js';

const suites: Record<string, () => Promise<Record<string, string>>> = {
  bundle: benchBundle,
  renders: benchRenders,
  journal: benchJournal,
  fanout: benchFanout,
  timers: benchTimers,
};

async function main(): Promise<void> {
  if (!existsSync(SERVER_MAIN)) throw new Error('Run "npm run build" first: the benchmarks drive the built server.');
  const only = process.argv.slice(2);
  for (const [name, run] of Object.entries(suites)) {
    if (only.length > 0 && !only.includes(name)) continue;
    const started = performance.now();
    const figures = await run();
    console.log(`\n## ${name} (${((performance.now() - started) / 1000).toFixed(1)} s)`);
    for (const [k, v] of Object.entries(figures)) console.log(`${k.padEnd(62)} ${v}`);
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
