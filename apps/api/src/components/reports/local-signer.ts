import { createHash, generateKeyPairSync, randomBytes } from 'node:crypto';
import { existsSync, linkSync, mkdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import path from 'node:path';

import { SignPdf } from '@signpdf/signpdf';
import { P12Signer } from '@signpdf/signer-p12';
import forge from 'node-forge';

import type { Signer, SignerDescription } from './signer.js';

export const LOCAL_SIGNING_SUBJECT = 'Polecourt local signing';

interface Bundle {
  p12: Buffer;
  passphrase: string;
}

/** SHA-256 of a certificate's DER encoding, hex: how Polecourt names a certificate. */
export function certificateFingerprint(cert: forge.pki.Certificate): string {
  const der = forge.asn1.toDer(forge.pki.certificateToAsn1(cert)).getBytes();
  return createHash('sha256').update(Buffer.from(der, 'binary')).digest('hex');
}

// A self-signed RSA 2048 certificate for document signing, valid ten years.
// The key pair comes from Node's crypto (fast, native) and is handed to
// node-forge, which builds the certificate and the PKCS#12 container.
function createBundle(): Bundle {
  const { privateKey: privatePem } = generateKeyPairSync('rsa', {
    modulusLength: 2048,
    privateKeyEncoding: { type: 'pkcs8', format: 'pem' },
    publicKeyEncoding: { type: 'spki', format: 'pem' },
  });
  const privateKey = forge.pki.privateKeyFromPem(privatePem) as forge.pki.rsa.PrivateKey;
  const publicKey = forge.pki.setRsaPublicKey(privateKey.n, privateKey.e);
  const cert = forge.pki.createCertificate();
  cert.publicKey = publicKey;
  // A positive random serial (leading byte below 0x80), as RFC 5280 asks.
  cert.serialNumber = `01${randomBytes(15).toString('hex')}`;
  const now = new Date();
  cert.validity.notBefore = new Date(now.getTime() - 60_000);
  cert.validity.notAfter = new Date(now.getTime() + 10 * 365.25 * 24 * 3600 * 1000);
  const subject = [
    { name: 'commonName', value: LOCAL_SIGNING_SUBJECT },
    { name: 'organizationName', value: 'Polecourt' },
  ];
  cert.setSubject(subject);
  cert.setIssuer(subject);
  cert.setExtensions([
    { name: 'basicConstraints', cA: false, critical: true },
    { name: 'keyUsage', digitalSignature: true, nonRepudiation: true, critical: true },
    { name: 'subjectKeyIdentifier' },
  ]);
  cert.sign(privateKey, forge.md.sha256.create());
  const passphrase = randomBytes(24).toString('base64url');
  const asn1 = forge.pkcs12.toPkcs12Asn1(privateKey, [cert], passphrase, { algorithm: '3des', friendlyName: LOCAL_SIGNING_SUBJECT });
  return { p12: Buffer.from(forge.asn1.toDer(asn1).getBytes(), 'binary'), passphrase };
}

// Writes a file so that it appears whole or not at all, and never replaces
// one already there (two processes starting at once keep the first one's).
function writeOnce(file: string, data: Buffer | string): boolean {
  const tmp = `${file}.${process.pid}.${randomBytes(4).toString('hex')}.tmp`;
  writeFileSync(tmp, data, { mode: 0o600 });
  try {
    linkSync(tmp, file);
    return true;
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code === 'EEXIST') return false;
    throw err;
  } finally {
    rmSync(tmp, { force: true });
  }
}

/**
 * The local signing bundle under `dir`: `signing.p12` and its passphrase in
 * `signing.pass` (both readable by the owner only). Made on first start.
 * With `passphrase` given (SIGNING_P12_PASSPHRASE), an existing `p12File`
 * is opened with it instead.
 */
export function loadOrCreateBundle(options: { dir: string; p12File?: string | undefined; passphrase?: string | undefined }): Bundle {
  if (options.p12File) {
    if (!options.passphrase) throw new Error('SIGNING_P12_PASSPHRASE is needed with SIGNING_P12_PATH');
    return { p12: readFileSync(options.p12File), passphrase: options.passphrase };
  }
  mkdirSync(options.dir, { recursive: true, mode: 0o700 });
  const p12File = path.join(options.dir, 'signing.p12');
  const passFile = path.join(options.dir, 'signing.pass');
  if (!existsSync(p12File)) {
    const made = createBundle();
    // The passphrase lands first: whoever sees the .p12 can always open it.
    if (writeOnce(passFile, made.passphrase)) writeOnce(p12File, made.p12);
  }
  // Another process may be between its two writes: wait briefly for the pair.
  for (let i = 0; i < 50 && !existsSync(p12File); i++) Atomics.wait(new Int32Array(new SharedArrayBuffer(4)), 0, 0, 20);
  return { p12: readFileSync(p12File), passphrase: readFileSync(passFile, 'utf8').trim() };
}

function describeBundle(bundle: Bundle): { cert: forge.pki.Certificate; description: SignerDescription } {
  const asn1 = forge.asn1.fromDer(bundle.p12.toString('binary'));
  const p12 = forge.pkcs12.pkcs12FromAsn1(asn1, bundle.passphrase);
  const bags = p12.getBags({ bagType: forge.pki.oids.certBag! })[forge.pki.oids.certBag!] ?? [];
  const cert = bags[0]?.cert;
  if (!cert) throw new Error('The signing PKCS#12 holds no certificate');
  const cn = cert.subject.getField('CN') as { value: string } | null;
  return {
    cert,
    description: {
      kind: 'local-p12',
      subject: cn?.value ?? 'unknown',
      certificateSha256: certificateFingerprint(cert),
      certificatePem: forge.pki.certificateToPem(cert),
      notAfter: cert.validity.notAfter.toISOString(),
    },
  };
}

/** Signs with the local PKCS#12 through @signpdf (a detached CMS signature over the byte range). */
export function createLocalSigner(bundle: Bundle): Signer {
  const { description } = describeBundle(bundle);
  const signPdf = new SignPdf();
  return {
    // A fresh P12Signer per file: @signpdf's reads its PKCS#12 buffer once and cannot sign twice.
    sign: (pdf, signingTime) => signPdf.sign(pdf, new P12Signer(bundle.p12, { passphrase: bundle.passphrase }), signingTime),
    describe: () => description,
  };
}
