import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

const here = (p: string) => fileURLToPath(new URL(p, import.meta.url));

/** The libs are consumed from source in tests and in the web build; only the server runs their compiled dist. */
export const workspaceAliases = {
  '@jarday/rules': here('./libs/rules/src/index.ts'),
  '@jarday/contracts': here('./libs/contracts/src/index.ts'),
  '@jarday/live': here('./libs/live/src/index.ts'),
};

export default defineConfig({
  resolve: { alias: workspaceAliases },
  test: {
    projects: [
      {
        extends: true,
        test: { name: 'libs', include: ['libs/*/src/**/*.spec.ts'], environment: 'node' },
      },
      {
        extends: true,
        // Nest needs decorator metadata to inject by type; Vite 8's Oxc transform emits it only when asked.
        oxc: { decorator: { legacy: true, emitDecoratorMetadata: true } },
        test: {
          name: 'server',
          root: here('./apps/server'),
          include: ['src/**/*.spec.ts', 'test/**/*.e2e-spec.ts'],
          environment: 'node',
          testTimeout: 20_000,
          hookTimeout: 30_000,
        },
      },
      {
        extends: true,
        test: {
          name: 'web',
          root: here('./apps/web'),
          include: ['src/**/*.spec.{ts,tsx}'],
          environment: 'happy-dom',
          setupFiles: ['./src/testing/setup.ts'],
        },
      },
    ],
  },
});
