import { createHash } from 'node:crypto';

import type { SignatureFinding } from '@polecourt/contracts';
import forge from 'node-forge';

import { certificateFingerprint } from './local-signer.js';

// Checks a PDF's signature as ISO 32000-1 §12.8 describes it: the signature
// dictionary's /ByteRange names the signed bytes (everything but the
// /Contents hex string), and /Contents holds a detached CMS SignedData
// (RFC 5652). Steps: find the last /ByteRange; check it covers the whole
// file; parse the CMS with node-forge; compare its message-digest attribute
// with the digest of the signed bytes; verify the RSA signature over the
// DER of the signed attributes with the certificate it names; and say
// whether that certificate is one of ours.

const OID_MESSAGE_DIGEST = '1.2.840.113549.1.9.4';
const DIGESTS: Record<string, { node: string; forge: () => forge.md.MessageDigest }> = {
  '2.16.840.1.101.3.4.2.1': { node: 'sha256', forge: () => forge.md.sha256.create() },
  '2.16.840.1.101.3.4.2.2': { node: 'sha384', forge: () => forge.md.sha384.create() },
  '2.16.840.1.101.3.4.2.3': { node: 'sha512', forge: () => forge.md.sha512.create() },
};

export interface SignatureCheck extends SignatureFinding {
  certificateSha256: string | null;
}

const NOTHING: SignatureCheck = {
  present: false,
  coversWholeFile: false,
  digestMatches: false,
  signatureMatches: false,
  signedByPolecourt: false,
  signerCertificate: null,
  certificateSha256: null,
  summary: 'The file carries no PDF signature.',
};

function findByteRange(pdf: Buffer): [number, number, number, number] | null {
  const text = pdf.toString('latin1');
  const re = /\/ByteRange\s*\[\s*(\d+)\s+(\d+)\s+(\d+)\s+(\d+)\s*\]/g;
  let last: RegExpExecArray | null = null;
  for (let m = re.exec(text); m; m = re.exec(text)) last = m;
  if (!last) return null;
  return [Number(last[1]), Number(last[2]), Number(last[3]), Number(last[4])];
}

function asn1Children(node: forge.asn1.Asn1): forge.asn1.Asn1[] {
  return Array.isArray(node.value) ? node.value : [];
}

/**
 * @param isOurs says whether a certificate fingerprint (SHA-256 of its DER) is one Polecourt signs with.
 */
export async function verifySignature(pdf: Buffer, isOurs: (fingerprint: string) => Promise<boolean>): Promise<SignatureCheck> {
  const range = findByteRange(pdf);
  if (!range) return NOTHING;
  const [a, b, c, d] = range;
  const found: SignatureCheck = { ...NOTHING, present: true, summary: '' };
  if (a !== 0 || b <= 0 || c <= b || c + d > pdf.length || d < 0) {
    return { ...found, summary: 'The signature’s byte range does not fit this file: the file was cut or changed.' };
  }
  found.coversWholeFile = c + d === pdf.length;
  const hexPart = pdf.subarray(b, c).toString('latin1');
  if (!hexPart.startsWith('<') || !hexPart.endsWith('>') || !/^[0-9a-fA-F]*$/.test(hexPart.slice(1, -1))) {
    return { ...found, summary: 'The signature contents are not where the byte range says: the file was changed.' };
  }

  let signerInfo: forge.asn1.Asn1;
  let certs: forge.pki.Certificate[];
  try {
    const der = Buffer.from(hexPart.slice(1, -1), 'hex').toString('binary');
    // The hex string is padded with zeros after the CMS: parse the first object only.
    const asn = forge.asn1.fromDer(der, { strict: false, parseAllBytes: false } as unknown as boolean);
    const msg = forge.pkcs7.messageFromAsn1(asn) as forge.pkcs7.PkcsSignedData & { rawCapture: { signerInfos?: forge.asn1.Asn1[] } };
    certs = msg.certificates ?? [];
    const infos = msg.rawCapture.signerInfos ?? [];
    if (infos.length !== 1 || !infos[0]) throw new Error('expected one signer');
    signerInfo = infos[0];
  } catch {
    return { ...found, summary: 'The signature is not a readable CMS signature.' };
  }

  const parts = asn1Children(signerInfo);
  const sid = parts[1];
  const digestAlg = parts[2];
  const signedAttrs = parts.find((p) => p.tagClass === forge.asn1.Class.CONTEXT_SPECIFIC && p.type === 0);
  const signature = parts.find((p, i) => i > 2 && p.tagClass === forge.asn1.Class.UNIVERSAL && p.type === forge.asn1.Type.OCTETSTRING);
  const digestOid = digestAlg ? forge.asn1.derToOid(asn1Children(digestAlg)[0]?.value as string) : '';
  const digest = DIGESTS[digestOid];
  if (!signedAttrs || !signature || !digest || !sid) {
    return { ...found, summary: 'The signature uses a form Polecourt does not check (no signed attributes or an unknown digest).' };
  }

  // The certificate named by issuer and serial number, else the only one.
  const serialHex = forge.util.createBuffer(asn1Children(sid)[1]?.value as string).toHex().replace(/^0+/, '');
  const cert = certs.find((x) => x.serialNumber.replace(/^0+/, '') === serialHex) ?? (certs.length === 1 ? certs[0] : undefined);

  const hash = createHash(digest.node).update(pdf.subarray(a, a + b)).update(pdf.subarray(c, c + d)).digest();
  let messageDigest: Buffer | null = null;
  for (const attr of asn1Children(signedAttrs)) {
    const [oid, values] = asn1Children(attr);
    if (oid && forge.asn1.derToOid(oid.value as string) === OID_MESSAGE_DIGEST) {
      const v = values ? asn1Children(values)[0] : undefined;
      if (v) messageDigest = Buffer.from(v.value as string, 'binary');
    }
  }
  found.digestMatches = messageDigest !== null && messageDigest.equals(hash);

  if (cert) {
    found.signerCertificate = (cert.subject.getField('CN') as { value: string } | null)?.value ?? 'unnamed certificate';
    found.certificateSha256 = certificateFingerprint(cert);
    try {
      // What is signed is the DER of the attributes as a SET OF (RFC 5652 §5.4).
      const set = forge.asn1.create(forge.asn1.Class.UNIVERSAL, forge.asn1.Type.SET, true, asn1Children(signedAttrs));
      const md = digest.forge();
      md.update(forge.asn1.toDer(set).getBytes());
      found.signatureMatches = (cert.publicKey as forge.pki.rsa.PublicKey).verify(md.digest().getBytes(), signature.value as string);
    } catch {
      found.signatureMatches = false;
    }
    found.signedByPolecourt = await isOurs(found.certificateSha256);
  }

  found.summary = !found.digestMatches
    ? 'The signed bytes have changed since signing: the digest in the signature does not match the file.'
    : !found.signatureMatches
      ? 'The signature value does not verify with the certificate it names.'
      : !found.coversWholeFile
        ? 'The signature is sound, but bytes were added to the file after signing.'
        : !found.signedByPolecourt
          ? `The signature is sound, but it was made with a certificate Polecourt does not sign with (${found.signerCertificate ?? 'none'}).`
          : 'The signature verifies over the whole file with Polecourt’s signing certificate.';
  return found;
}
