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
});
