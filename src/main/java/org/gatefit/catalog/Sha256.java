package org.gatefit.catalog;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;

/**
 * SHA-256 (FIPS 180-4) through the JDK's {@link MessageDigest}, written as 64 lower-case hex
 * digits as {@code sha256sum} prints it: the one place gatefit hashes files (imported sheets,
 * report inputs, the catalog's content).
 */
public final class Sha256 {
    private Sha256() {
    }

    /** A fresh SHA-256 digest. */
    public static MessageDigest digest() {
        try {
            return MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 missing from the JVM", e);
        }
    }

    /** {@code digest}'s value as lower-case hex (the digest is reset). */
    public static String hex(MessageDigest digest) {
        return HexFormat.of().formatHex(digest.digest());
    }

    /** The SHA-256 of {@code bytes}, as hex. */
    public static String of(byte[] bytes) {
        MessageDigest d = digest();
        d.update(bytes);
        return hex(d);
    }

    /** The SHA-256 of the bytes of {@code file}, as hex. */
    public static String of(Path file) throws IOException {
        MessageDigest d = digest();
        byte[] buf = new byte[1 << 16];
        try (InputStream in = Files.newInputStream(file)) {
            for (int n; (n = in.read(buf)) > 0; ) {
                d.update(buf, 0, n);
            }
        }
        return hex(d);
    }
}
