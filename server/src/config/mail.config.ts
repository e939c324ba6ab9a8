import { registerAs } from '@nestjs/config';
import { validateEnv } from './env.validation';

export const mailConfig = registerAs('mail', () => {
  const env = validateEnv(process.env);
  return {
    host: env.SMTP_HOST,
    port: env.SMTP_PORT,
    secure: env.SMTP_SECURE === 'true',
    user: env.SMTP_USER,
    pass: env.SMTP_PASS,
    from: env.MAIL_FROM,
  };
});
export type MailConfig = ReturnType<typeof mailConfig>;
