import path from 'node:path';

import type { Config } from '../../config.js';

export interface ReportSettings {
  dataDir: string;
  signingDir: string;
  p12File: string | undefined;
  p12Passphrase: string | undefined;
  s3Fake: boolean;
  /** The fake's port (0 = any free one). */
  s3FakePort: number;
  s3FakeDir: string;
  s3Endpoint: string | undefined;
  s3Region: string;
  s3Bucket: string;
  s3ForcePathStyle: boolean;
  s3AccessKeyId: string | undefined;
  s3SecretAccessKey: string | undefined;
}

// s3rver's built-in account: any other key is refused by the fake.
export const FAKE_KEY = 'S3RVER';

/** The report settings with their environment-dependent defaults filled in. */
export function reportSettings(config: Config): ReportSettings {
  const root = config.POLECOURT_ROOT ?? path.resolve(import.meta.dirname, '../../../../..');
  const dataDir = path.resolve(config.POLECOURT_DATA_DIR ?? path.join(root, '.data'));
  const s3Fake = config.S3_FAKE ?? config.NODE_ENV !== 'production';
  return {
    dataDir,
    signingDir: path.join(dataDir, 'signing'),
    p12File: config.SIGNING_P12_PATH,
    p12Passphrase: config.SIGNING_P12_PASSPHRASE,
    s3Fake,
    s3FakePort: config.S3_PORT ?? (config.NODE_ENV === 'test' ? 0 : 5183),
    s3FakeDir: path.join(dataDir, 'object-store'),
    s3Endpoint: config.S3_ENDPOINT,
    s3Region: config.S3_REGION,
    s3Bucket: config.S3_BUCKET,
    s3ForcePathStyle: config.S3_FORCE_PATH_STYLE ?? s3Fake,
    s3AccessKeyId: config.S3_ACCESS_KEY_ID ?? (s3Fake ? FAKE_KEY : undefined),
    s3SecretAccessKey: config.S3_SECRET_ACCESS_KEY ?? (s3Fake ? FAKE_KEY : undefined),
  };
}
