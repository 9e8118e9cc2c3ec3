// Loaded before every test file (vitest setupFiles), before AppModule reads the environment.
process.env.JWT_SECRET ??= 'test-jwt-secret-test-jwt-secret-0123456789';
process.env.CSRF_SECRET ??= 'test-csrf-secret-test-csrf-secret-012345678';
process.env.CALENDAR_SECRET ??= 'test-calendar-secret-test-calendar-secret-01';
process.env.TOTP_ENCRYPTION_KEY ??= '7f3c1e9a5b2d4f6081a3c5e7092b4d6f8a1c3e5f7092b4d6e8f0a2c4e6081a3c';
process.env.DATABASE_URL = process.env.TEST_DATABASE_URL ?? 'postgres://app@127.0.0.1:54329/broodsilk_test';
process.env.LOG_LEVEL ??= 'silent';
process.env.AUTH_RATE_LIMIT ??= '1000';
if (!process.env.DATABASE_URL.includes('test')) {
  throw new Error(`Refusing to run tests against ${process.env.DATABASE_URL}: the database name must contain "test".`);
}
// Photo storage: an S3-compatible fake (s3rver) on 127.0.0.1:4569 (as `npm start` runs it) unless the test script says otherwise.
process.env.S3_ENDPOINT ??= 'http://127.0.0.1:4569';
process.env.S3_REGION ??= 'us-east-1';
process.env.S3_BUCKET ??= 'broodsilk-photos-test';
process.env.S3_ACCESS_KEY_ID ??= 'S3RVER';
process.env.S3_SECRET_ACCESS_KEY ??= 'S3RVER';
process.env.S3_FORCE_PATH_STYLE ??= 'true';
// Payments: the local fake's keys (a spec that talks to the fake starts it and sets STRIPE_API_*).
process.env.STRIPE_SECRET_KEY ??= 'sk_test_broodsilk_tests_0123456789';
process.env.STRIPE_WEBHOOK_SECRET ??= 'whsec_broodsilk_tests_abcdefghijklmnop';
