package org.plateward.opcua;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.security.KeyFactory;
import java.security.KeyPair;
import java.security.PrivateKey;
import java.security.cert.X509Certificate;
import java.security.spec.PKCS8EncodedKeySpec;
import org.eclipse.milo.opcua.stack.core.util.CertificateUtil;
import org.eclipse.milo.opcua.stack.core.util.SelfSignedCertificateBuilder;
import org.eclipse.milo.opcua.stack.core.util.SelfSignedCertificateGenerator;

/**
 * Plateward's own application certificate for secure OPC UA channels, kept in {@code
 * <pki>/own/}: {@code plateward.der} (the certificate, to give to the server's administrator)
 * and {@code plateward-key.pk8} (the private key, readable by the owner only). Created
 * self-signed on first use, with the application URI as its SAN URI.
 *
 * @param keyPair our key pair
 * @param certificate our certificate
 */
record ClientCertificate(KeyPair keyPair, X509Certificate certificate) {
  static final String CERT_FILE = "plateward.der";
  static final String KEY_FILE = "plateward-key.pk8";

  /** Loads the certificate from {@code ownDir}, or creates and stores a new one. */
  static ClientCertificate loadOrCreate(Path ownDir, String applicationUri) throws IOException {
    Path cert = ownDir.resolve(CERT_FILE);
    Path key = ownDir.resolve(KEY_FILE);
    try {
      if (Files.exists(cert) && Files.exists(key)) {
        X509Certificate c = CertificateUtil.decodeCertificate(Files.readAllBytes(cert));
        PrivateKey k =
            KeyFactory.getInstance("RSA")
                .generatePrivate(new PKCS8EncodedKeySpec(Files.readAllBytes(key)));
        return new ClientCertificate(new KeyPair(c.getPublicKey(), k), c);
      }
      Files.createDirectories(ownDir);
      KeyPair kp = SelfSignedCertificateGenerator.generateRsaKeyPair(2048);
      X509Certificate c =
          new SelfSignedCertificateBuilder(kp)
              .setCommonName("Plateward monitor")
              .setOrganization("Plateward")
              .setApplicationUri(applicationUri)
              .addDnsName("localhost")
              .build();
      Files.write(key, kp.getPrivate().getEncoded());
      try {
        Files.setPosixFilePermissions(key, PosixFilePermissions.fromString("rw-------"));
      } catch (UnsupportedOperationException e) {
        // not a POSIX file system; the folder's own permissions apply
      }
      Files.write(cert, c.getEncoded());
      return new ClientCertificate(kp, c);
    } catch (IOException e) {
      throw e;
    } catch (Exception e) {
      throw new IOException("cannot load or create the application certificate in " + ownDir
          + ": " + e.getMessage(), e);
    }
  }
}
