// Runs in every test worker before the test file: the test profile of the configuration.
process.env.NODE_ENV = 'test';
process.env.BCRYPT_COST = '4';
process.env.LOG_LEVEL = process.env.LOG_LEVEL_TEST ?? 'silent';
// High enough that ordinary tests never meet them; the limit tests set their own.
process.env.RATE_LIMIT_SIGNIN ??= '1000';
process.env.RATE_LIMIT_SIGNUP ??= '1000';
process.env.RATE_LIMIT_PASSWORD_RESET ??= '1000';
