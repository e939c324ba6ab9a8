import { registerAs } from '@nestjs/config';
import { validateEnv } from './env.validation';

export const databaseConfig = registerAs('database', () => {
  const env = validateEnv(process.env);
  return { url: env.DATABASE_URL, poolSize: env.DATABASE_POOL_SIZE };
});
export type DatabaseConfig = ReturnType<typeof databaseConfig>;
