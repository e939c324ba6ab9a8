import { registerAs } from '@nestjs/config';
import { isAbsolute, resolve } from 'node:path';
import { validateEnv } from './env.validation';

/** The repository root, from src/config or dist/config alike. */
const REPO_ROOT = resolve(__dirname, '..', '..', '..');

export const mediaConfig = registerAs('media', () => {
  const env = validateEnv(process.env);
  return { dir: isAbsolute(env.MEDIA_DIR) ? env.MEDIA_DIR : resolve(REPO_ROOT, env.MEDIA_DIR) };
});
export type MediaConfig = ReturnType<typeof mediaConfig>;
