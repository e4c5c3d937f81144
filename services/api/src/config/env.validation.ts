import * as Joi from 'joi';

/**
 * Every setting the API reads from its environment, validated at start so a typo fails fast with
 * the variable's name instead of surfacing later as a confusing error.
 */
export const envValidationSchema = Joi.object({
  NODE_ENV: Joi.string().valid('development', 'production', 'test').default('development'),
  PORT: Joi.number().port().default(3000),
  HOST: Joi.string().default('0.0.0.0'),
  DATABASE_URL: Joi.string()
    .uri({ scheme: ['mariadb', 'mysql'] })
    .required()
    .messages({
      'any.required': 'DATABASE_URL is required (npm start sets it for the private MariaDB).',
    }),
  REDIS_URL: Joi.string()
    .uri({ scheme: ['redis', 'rediss'] })
    .required()
    .messages({
      'any.required': 'REDIS_URL is required (npm start sets it for the private Redis).',
    }),
  LOG_LEVEL: Joi.string()
    .valid('fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent')
    .default('info'),
  // Serve the built web app from this process; defaults to on in production.
  SERVE_WEB: Joi.boolean().optional(),
  WEB_DIST_DIR: Joi.string().optional(),
  // Address people reach the app at; links in e-mails start with it.
  APP_URL: Joi.string()
    .uri({ scheme: ['http', 'https'] })
    .optional(),
  JWT_SECRET: Joi.string()
    .min(32)
    .required()
    .messages({ 'any.required': 'JWT_SECRET is required (npm start generates one in .data/).' }),
  ACCESS_TOKEN_MINUTES: Joi.number().integer().min(1).max(60).default(15),
  REFRESH_TOKEN_DAYS: Joi.number().integer().min(1).max(90).default(14),
  SIGN_IN_LOCK_AFTER: Joi.number().integer().min(3).max(20).default(5),
  SIGN_IN_LOCK_MINUTES: Joi.number().integer().min(1).max(1440).default(15),
  SIGN_IN_THROTTLE_PER_MINUTE: Joi.number().integer().min(1).max(1000).default(10),
  INVITATION_DAYS: Joi.number().integer().min(1).max(30).default(7),
  PASSWORD_RESET_MINUTES: Joi.number().integer().min(5).max(1440).default(60),
  // Without it, mail goes to the in-process catcher whose messages admins read in the app.
  SMTP_URL: Joi.string()
    .uri({ scheme: ['smtp', 'smtps'] })
    .optional(),
  MAIL_FROM: Joi.string().default('Tallyloom <no-reply@tallyloom.example>'),
  // Uploaded scans; defaults to <repo>/.data/uploads.
  UPLOADS_DIR: Joi.string().optional(),
  // Largest accepted upload, in bytes (10 MiB by default).
  UPLOAD_MAX_BYTES: Joi.number()
    .integer()
    .min(1)
    .max(100 * 1024 * 1024)
    .default(10 * 1024 * 1024),
  // How long an export's download link works (and its file is kept) after the export is done.
  EXPORT_LINK_TTL_MINUTES: Joi.number().integer().min(1).max(10_080).default(60),
  // Rows per xlsx sheet, header and totals included, before a table continues on the next sheet.
  // Only lower than Excel's limit (for tests and for people whose programs take fewer); at least
  // 3, so a sheet holds the header, one data row and the totals.
  EXPORT_XLSX_ROWS_PER_SHEET: Joi.number().integer().min(3).max(1_048_576).default(1_048_576),
  // Key of the download links' signatures; without it, one is derived from JWT_SECRET.
  EXPORT_LINK_SECRET: Joi.string().min(32).optional(),
  // 'in-process': this process runs every job processor; 'off': it only enqueues (`npm run worker` runs them).
  JOB_PROCESSORS: Joi.string().valid('in-process', 'off').default('in-process'),
  // How long a worker's hold on a job lasts before another worker takes the job over (Bull's lock).
  JOB_LOCK_MS: Joi.number().integer().min(1000).max(600_000).default(30_000),
  // How often each worker looks for jobs whose holder died.
  JOB_STALLED_CHECK_MS: Joi.number().integer().min(500).max(600_000).default(30_000),
});
