// A local S3-compatible store (s3rver) for `npm run cluster` and the cluster drill. Runs after npm ci.
import { mkdirSync } from 'node:fs';
import S3rver from 's3rver';

const dir = process.env.S3_DIR ?? '.data/cluster/s3';
mkdirSync(dir, { recursive: true });
const server = new S3rver({
  address: '127.0.0.1',
  port: Number(process.env.S3_PORT ?? 5535),
  silent: true,
  directory: dir,
  configureBuckets: [{ name: process.env.S3_BUCKET ?? 'rodewise-uploads', configs: [] }],
});
const addr = await server.run();
console.log(`S3 stand-in on http://127.0.0.1:${addr.port}`);
const stop = () => void server.close().then(() => process.exit(0));
process.on('SIGTERM', stop);
process.on('SIGINT', stop);
