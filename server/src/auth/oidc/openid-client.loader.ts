import { pathToFileURL } from 'node:url';
import type * as OpenIdClient from 'openid-client';

export type OpenIdClientModule = typeof OpenIdClient;

// openid-client is ESM-only. Under `module: commonjs` TypeScript turns `import()` into `require()`,
// so the import is built at run time to stay a real dynamic import. It runs only when sign-on is
// used, which keeps the package out of jest's module system (the in-process suites never sign on).
const nativeImport = new Function('specifier', 'return import(specifier)') as (specifier: string) => Promise<unknown>;

let loading: Promise<OpenIdClientModule> | undefined;

/** openid-client, loaded on first use and kept. */
export function loadOpenIdClient(): Promise<OpenIdClientModule> {
  loading ??= (nativeImport(pathToFileURL(require.resolve('openid-client')).href) as Promise<OpenIdClientModule>).catch((err: unknown) => {
    loading = undefined;
    throw err;
  });
  return loading;
}
