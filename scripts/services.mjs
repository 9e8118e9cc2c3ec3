// Local stand-ins for the hosted services, in one process bound to 127.0.0.1:
// a mail sink with a web inbox (maildev), an S3-compatible store (s3rver) and
// the payment provider fake (scripts/payment-fake). Ports come from the environment;
// when all are listening it prints one line "services ready".
import { existsSync, mkdirSync } from 'node:fs';
import { fileURLToPath, pathToFileURL } from 'node:url';
import path from 'node:path';

const here = path.dirname(fileURLToPath(import.meta.url));
const env = process.env;
const stops = [];

async function startMail() {
  const { MailDev } = await import('maildev');
  const maildev = new MailDev({
    smtp: Number(env.SMTP_PORT ?? 1025),
    ip: '127.0.0.1',
    web: Number(env.MAILDEV_WEB_PORT ?? 1080),
    webIp: '127.0.0.1',
    silent: true,
    log: { verbose: false, silent: true, logMailContents: false },
  });
  await maildev.start();
  stops.push(() => maildev.stop());
  return `mail sink: SMTP 127.0.0.1:${env.SMTP_PORT ?? 1025}, inbox http://127.0.0.1:${env.MAILDEV_WEB_PORT ?? 1080}`;
}

async function startS3() {
  const { default: S3rver } = await import('s3rver');
  const directory = env.S3RVER_DIR ?? path.join(here, '..', '.data', 's3');
  mkdirSync(directory, { recursive: true });
  const port = Number(env.S3_PORT ?? 4569);
  const server = new S3rver({ port, address: '127.0.0.1', silent: true, directory, configureBuckets: [{ name: env.S3_BUCKET ?? 'broodsilk-photos' }] });
  await server.run();
  stops.push(() => server.close());
  return `object store (S3 API): http://127.0.0.1:${port}`;
}

async function startPayments() {
  const file = path.join(here, 'payment-fake', 'server.mjs');
  if (!existsSync(file)) return null;
  const { startPaymentFake } = await import(pathToFileURL(file).href);
  const fake = await startPaymentFake({
    port: Number(env.STRIPE_API_PORT ?? 12111),
    host: '127.0.0.1',
    secretKey: env.STRIPE_SECRET_KEY,
    webhookSecret: env.STRIPE_WEBHOOK_SECRET,
    webhookUrl: env.PAYMENT_WEBHOOK_URL,
  });
  stops.push(() => fake.close());
  return `payment provider fake: ${fake.url}`;
}

async function stopAll() {
  await Promise.allSettled(stops.map((stop) => stop()));
  process.exit(0);
}
process.on('SIGINT', stopAll);
process.on('SIGTERM', stopAll);

try {
  const lines = (await Promise.all([startMail(), startS3(), startPayments()])).filter(Boolean);
  for (const line of lines) console.log(`  ${line}`);
  console.log('services ready');
} catch (err) {
  console.error('services failed to start:', err);
  await Promise.allSettled(stops.map((stop) => stop()));
  process.exit(1);
}
