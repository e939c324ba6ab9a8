// Loaded before any suite imports the app: ConfigModule validates process.env at import time.
Object.assign(process.env, {
  NODE_ENV: 'test',
  APP_SECRET: 'test-secret-test-secret-test-secret-0123',
  PUBLIC_URL: 'http://127.0.0.1:3999',
  LOG_LEVEL: 'error',
});
