package org.gatefit.catalog;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.gatefit.testsupport.Sha256Sum;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** {@link Sha256} against the published test vectors and against {@code sha256sum}, the reference tool. */
class Sha256Test {
    @TempDir
    Path tmp;

    @ParameterizedTest
    @CsvSource({
        // FIPS 180-2, Appendix B.1: one-block message "abc"
        "abc, ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad",
        // FIPS 180-2, Appendix B.2: two-block message
        "abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq,"
            + " 248d6a61d20638b8e5c026930c3e6039a33ce45964ff2167f6ecedd419db06c1",
        // the empty message: from memory (what sha256sum prints for an empty file)
        "'', e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855",
    })
    void bytesHashToThePublishedVectors(String message, String expected) throws IOException {
        byte[] bytes = message.getBytes(StandardCharsets.US_ASCII);
        assertEquals(expected, Sha256.of(bytes));
        Path f = tmp.resolve("m.bin");
        Files.write(f, bytes);
        assertEquals(expected, Sha256.of(f), "the same bytes read from a file");
    }

    @Test
    void aFileLongerThanTheReadBufferHashesAsSha256sumPrintsIt() throws Exception {
        Path f = tmp.resolve("long.bin");
        byte[] b = new byte[(1 << 16) * 3 + 17]; // several reads, the last one short
        for (int i = 0; i < b.length; i++) {
            b[i] = (byte) (i * 31 + (i >> 8));
        }
        Files.write(f, b);
        String ours = Sha256.of(f);
        assertTrue(ours.matches("[0-9a-f]{64}"), ours);
        String ref = Sha256Sum.of(f);
        Assumptions.assumeTrue(ref != null, "sha256sum (GNU coreutils) not on this machine");
        assertEquals(ref, ours, "sha256sum " + f);
    }
}
