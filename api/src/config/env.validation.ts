import { plainToInstance, Type } from 'class-transformer';
import { IsEmail, IsIn, IsInt, IsOptional, IsString, Max, Min, MinLength, validateSync } from 'class-validator';

/** Every environment variable the API reads. Boot fails with a list of what is wrong. */
export class EnvironmentVariables {
  @IsIn(['development', 'production', 'test'])
  NODE_ENV: 'development' | 'production' | 'test' = 'development';

  @Type(() => Number) @IsInt() @Min(1) @Max(65535)
  PORT = 3000;

  @IsString()
  HOST = '127.0.0.1';

  @IsString()
  DATABASE_PATH = 'data/wiretrail.sqlite';

  @IsString() @MinLength(32, { message: 'JWT_SECRET must be at least 32 characters (npm start generates one)' })
  JWT_SECRET: string;

  @Type(() => Number) @IsInt() @Min(30)
  ACCESS_TOKEN_TTL_SECONDS = 900;

  @Type(() => Number) @IsInt() @Min(1)
  REFRESH_TOKEN_TTL_DAYS = 30;

  @Type(() => Number) @IsInt() @Min(1)
  SIGN_IN_RATE_LIMIT = 10;

  @Type(() => Number) @IsInt() @Min(1000)
  SIGN_IN_RATE_WINDOW_MS = 60_000;

  @IsOptional() @IsString()
  WEB_DIST?: string;

  @IsString()
  SMTP_HOST = '127.0.0.1';

  @Type(() => Number) @IsInt() @Min(1) @Max(65535)
  SMTP_PORT = 1025;

  @IsString()
  MAIL_FROM = 'Wiretrail <no-reply@wiretrail.local>';

  @IsOptional() @IsEmail({ require_tld: false })
  SUPPORT_EMAIL?: string;
}

export function validateEnvironment(config: Record<string, unknown>): EnvironmentVariables {
  const env = plainToInstance(EnvironmentVariables, config, { enableImplicitConversion: false });
  const errors = validateSync(env, { skipMissingProperties: false, whitelist: false });
  if (errors.length > 0) {
    const lines = errors.flatMap((e) => Object.values(e.constraints ?? {}));
    throw new Error(`Invalid environment:\n- ${lines.join('\n- ')}`);
  }
  return env;
}
