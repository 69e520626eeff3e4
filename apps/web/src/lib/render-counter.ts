import type { ProfilerOnRenderCallback } from 'react';

/**
 * Render counts for `npm run bench`, recorded only in a `vite build --mode profile` build (which uses React's
 * profiling build so that <Profiler> reports). In every other build these are no-ops the minifier drops.
 */
const PROFILING = import.meta.env.MODE === 'profile';

type Counts = Record<string, number>;
const counts = (): Counts => ((globalThis as { __jardayRenders?: Counts }).__jardayRenders ??= {});

/** Call in a component's body: counts how often it renders. */
export function countRender(name: string): void {
  if (PROFILING) counts()[name] = (counts()[name] ?? 0) + 1;
}

/** A <Profiler onRender>: counts the commits that touched the profiled tree. */
export const countCommits: ProfilerOnRenderCallback = (id) => {
  if (PROFILING) counts()[`commits:${id}`] = (counts()[`commits:${id}`] ?? 0) + 1;
};
