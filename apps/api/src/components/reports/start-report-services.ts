import type { Config } from '../../config.js';
import { createS3Archive } from './archive.js';
import { createLocalSigner, loadOrCreateBundle } from './local-signer.js';
import { startS3Fake, type S3Fake } from './s3-fake.js';
import { setReportServices, type ReportServices } from './services.js';
import { reportSettings } from './settings.js';

export interface RunningReportServices extends ReportServices {
  s3Fake: S3Fake | null;
  stop(): Promise<void>;
}

/** Loads (or makes) the signing certificate, starts the object-storage fake if configured, connects the archive. */
export async function startReportServices(config: Config): Promise<RunningReportServices> {
  const s = reportSettings(config);
  const signer = createLocalSigner(loadOrCreateBundle({ dir: s.signingDir, p12File: s.p12File, passphrase: s.p12Passphrase }));
  const fake = s.s3Fake
    ? await startS3Fake({ port: s.s3FakePort, directory: s.s3FakeDir, bucket: s.s3Bucket }).catch((err: unknown) => {
        const why = err instanceof Error ? err.message : String(err);
        throw new Error(`The local object-storage fake could not listen on 127.0.0.1:${s.s3FakePort} (${why}); set S3_PORT to a free port.`);
      })
    : null;
  const archive = createS3Archive({
    bucket: s.s3Bucket,
    region: s.s3Region,
    endpoint: fake ? fake.endpoint : s.s3Endpoint,
    forcePathStyle: s.s3ForcePathStyle,
    accessKeyId: s.s3AccessKeyId,
    secretAccessKey: s.s3SecretAccessKey,
  });
  const services = { signer, archive };
  setReportServices(services);
  return {
    ...services,
    s3Fake: fake,
    async stop() {
      setReportServices(null);
      archive.close();
      await fake?.close();
    },
  };
}
