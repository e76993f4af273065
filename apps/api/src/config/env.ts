import { z } from 'zod';

const port = (fallback: number) => z.coerce.number().int().min(0).max(65535).default(fallback);
const url = (fallback: string) => z.url({ error: 'must be a URL' }).default(fallback);

const envSchema = z
  .object({
    NODE_ENV: z.enum(['development', 'test', 'production']).default('development'),
    HOST: z.string().min(1).default('127.0.0.1'),
    PORT: port(3000),
    PUBLIC_URL: z.url({ error: 'must be a URL' }).optional(),
    DATABASE_URL: z
      .string()
      .regex(/^postgres(ql)?:\/\//, 'must be a postgres:// URL')
      .default('postgres://postgres@127.0.0.1:5433/fryline'),
    SESSION_SECRET: z.string().min(16, 'must be at least 16 characters').default('fryline-local-session-secret'),
    OAUTH_URL: url('http://127.0.0.1:3101'),
    OAUTH_CLIENT_ID: z.string().min(1).default('fryline-local'),
    OAUTH_CLIENT_SECRET: z.string().min(1).default('fryline-local-secret'),
    STRIPE_SECRET_KEY: z.string().startsWith('sk_', 'must start with sk_').default('sk_test_fryline_local'),
    STRIPE_API_URL: url('http://127.0.0.1:3102'),
    STRIPE_WEBHOOK_SECRET: z.string().startsWith('whsec_', 'must start with whsec_').default('whsec_fryline_local'),
    SMTP_HOST: z.string().min(1).default('127.0.0.1'),
    SMTP_PORT: port(2525),
    MAIL_FROM: z.string().min(3).default('Fryline orders <orders@fryline.test>'),
    HOLD_MINUTES: z.coerce.number().int().min(1).max(120).default(10),
    JOBS: z.enum(['on', 'off']).default('on'),
    LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
    STATIC_DIR: z.string().optional(),
  })
  .superRefine((env, ctx) => {
    if (env.NODE_ENV === 'production' && env.SESSION_SECRET === 'fryline-local-session-secret') {
      ctx.addIssue({ code: 'custom', path: ['SESSION_SECRET'], message: 'must be set to a secret value in production' });
    }
  });

export type Env = z.infer<typeof envSchema>;

export interface Config extends Env {
  publicUrl: string;
  secureCookies: boolean;
}

export class ConfigError extends Error {
  constructor(public readonly problems: string[]) {
    super(`Fryline cannot start; fix these settings:\n${problems.map((p) => `  - ${p}`).join('\n')}`);
  }
}

/** Parses the environment once at boot and reports every bad variable together. */
export function loadConfig(source: NodeJS.ProcessEnv | Record<string, string | undefined> = process.env): Config {
  const parsed = envSchema.safeParse(source);
  if (!parsed.success) {
    throw new ConfigError(
      parsed.error.issues.map((issue) => {
        const name = issue.path.join('.');
        return `${name}: ${issue.message} (got ${JSON.stringify(source[name] ?? null)})`;
      }),
    );
  }
  const env = parsed.data;
  const publicUrl = (env.PUBLIC_URL ?? `http://127.0.0.1:${env.PORT}`).replace(/\/$/, '');
  return { ...env, publicUrl, secureCookies: publicUrl.startsWith('https:') };
}
