package org.gatefit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.RandomAccessFile;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Damaged index files (issue 14, finding 11): every read worded as damage with what to do (exit
 * 4), never a wrong answer or an internal error; {@code gatefit verify} finds every damaged file;
 * an import refuses to build on a damaged catalog and changes nothing. Input: the invented example
 * catalogs; the damage is two flipped bits, a cut-short file, a deleted file.
 */
class DamagedCatalogCliTest {
    private static final Path SWITCHES = Project.file("examples/switches.csv");
    /** A switch of the example catalog. */
    private static final String SWITCH = "CVL-1025TL";

    @TempDir
    Path tmp;
    Path catalog;

    @BeforeEach
    void importExamples() {
        catalog = CliRun.examples(tmp.resolve("catalog"));
    }

    /** The largest index file whose name ends with {@code suffix}. */
    private Path largest(String suffix) throws IOException {
        try (Stream<Path> s = Files.list(catalog)) {
            return s.filter(p -> p.getFileName().toString().endsWith(suffix))
                    .max(Comparator.comparingLong(p -> p.toFile().length())).orElseThrow();
        }
    }

    /** Flips one bit in each of two bytes in the middle of the file (header and footer left alone). */
    private static void flipTwoBytes(Path file) throws IOException {
        try (RandomAccessFile f = new RandomAccessFile(file.toFile(), "rw")) {
            long mid = f.length() / 2;
            for (long at : new long[] {mid, mid + 7}) {
                f.seek(at);
                int b = f.read();
                f.seek(at);
                f.write(b ^ 0x04);
            }
        }
    }

    private static void assertDamaged(CliRun r, String file) {
        assertEquals(ExitCode.ENVIRONMENT, r.exit(), r.dump());
        assertTrue(r.err().contains("is damaged"), r.dump());
        assertTrue(r.err().contains("What to do: import your CSV files again"), r.dump());
        assertTrue(r.err().contains(file), "names " + file + ": " + r.dump());
        assertFalse(r.err().contains("internal error"), r.dump());
        assertEquals(1, r.err().strip().lines().count(), "one message: " + r.dump());
    }

    @Test
    void verifySaysASoundCatalogIsSound() {
        CliRun r = CliRun.on(catalog, "verify");
        assertEquals(ExitCode.OK, r.exit(), r.dump());
        assertTrue(r.out().contains("every checksum matches"), r.dump());
        assertTrue(r.out().contains("79 parts"), "47 switches and 32 drivers in the example files: " + r.dump());
    }

    @Test
    void twoFlippedBytesAreReportedByEveryReadNotAnsweredWrongly() throws Exception {
        for (String suffix : List.of(".dvd", ".fdt", ".tim", ".kdd")) {
            deleteCatalog();
            importExamples(); // the same catalog again, undamaged
            Path file = largest(suffix);
            flipTwoBytes(file);
            String name = file.getFileName().toString();
            assertDamaged(CliRun.on(catalog, "show", SWITCH), name);
            assertDamaged(CliRun.on(catalog, "export", "--kind", "driver"), name);
            assertDamaged(CliRun.on(catalog, "shortlist", "--switch", SWITCH, "--side", "low", "--bus", "48",
                    "--freq", "100"), name);
            assertDamaged(CliRun.on(catalog, "info"), name);
            assertDamaged(CliRun.on(catalog, "verify"), name);
        }
    }

    private void deleteCatalog() throws IOException {
        try (Stream<Path> s = Files.walk(catalog)) {
            for (Path p : s.sorted(Comparator.reverseOrder()).toList()) {
                Files.delete(p);
            }
        }
    }

    @Test
    void importRefusesToBuildOnADamagedCatalogAndChangesNothing() throws Exception {
        Path file = largest(".fdt");
        flipTwoBytes(file);
        Map<String, String> before = CatalogFolderCliTest.files(catalog);
        // one new switch: every segment of the catalog stays in the next commit
        Path one = Files.writeString(tmp.resolve("one.csv"), "part_number,maker,technology,v_block_v,v_gs_max_v,"
                + "v_gs_min_v,q_g_nc\nTST-NEW-1,Testmaker,si-mosfet,100,20,-20,50\n");
        CliRun r = CliRun.on(catalog, "import", one.toString());
        assertDamaged(r, file.getFileName().toString());
        assertTrue(r.err().contains("nothing was imported"), r.dump());
        assertEquals(before, CatalogFolderCliTest.files(catalog));
    }

    @Test
    void aCutShortFileIsWordedAsDamage() throws Exception {
        Path file = largest(".fdt");
        try (RandomAccessFile f = new RandomAccessFile(file.toFile(), "rw")) {
            f.setLength(f.length() / 2);
        }
        assertDamaged(CliRun.on(catalog, "show", SWITCH), file.getFileName().toString());
        assertDamaged(CliRun.on(catalog, "verify"), file.getFileName().toString());
    }

    @Test
    void aMissingFileIsWordedAsDamage() throws Exception {
        Path file = largest(".si");
        Files.delete(file);
        assertDamaged(CliRun.on(catalog, "show", SWITCH), file.getFileName().toString());
        assertDamaged(CliRun.on(catalog, "export", "--kind", "switch"), file.getFileName().toString());
        assertDamaged(CliRun.on(catalog, "verify"), file.getFileName().toString());
    }

    @Test
    void aDamagedCommitFileIsWordedAsDamage() throws Exception {
        Path commit;
        try (Stream<Path> s = Files.list(catalog)) {
            commit = s.filter(p -> p.getFileName().toString().startsWith("segments_")).findFirst().orElseThrow();
        }
        flipTwoBytes(commit);
        assertDamaged(CliRun.on(catalog, "show", SWITCH), commit.getFileName().toString());
        assertDamaged(CliRun.on(catalog, "verify"), commit.getFileName().toString());
        assertDamaged(CliRun.on(catalog, "import", SWITCHES.toString()), commit.getFileName().toString());
    }
}
