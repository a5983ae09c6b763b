/**
 * What signs a compliance report. The local signer below keeps a self-signed
 * certificate under the data folder; a hosted signing service (a company CA,
 * an HSM, a qualified trust service) can replace it behind this interface.
 */
export interface Signer {
  /** Signs a PDF that already carries a signature placeholder; returns the signed file. */
  sign(pdf: Buffer, signingTime?: Date): Promise<Buffer>;
  describe(): SignerDescription;
}

export interface SignerDescription {
  kind: string;
  /** The certificate's subject, as people read it. */
  subject: string;
  /** SHA-256 of the certificate's DER bytes, hex. */
  certificateSha256: string;
  /** The certificate itself, PEM. */
  certificatePem: string;
  notAfter: string;
}
