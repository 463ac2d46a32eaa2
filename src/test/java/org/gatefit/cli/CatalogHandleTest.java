package org.gatefit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.gatefit.catalog.Kind;
import org.gatefit.index.Catalog;
import org.gatefit.index.CatalogFormatException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The server's catalog handles ({@link Catalog#handle}, {@link Catalog#isCurrent}): a handle keeps
 * its point-in-time view through another import and after the view it came from is closed; the view
 * notices the new commit.
 */
class CatalogHandleTest {
    @TempDir
    Path tmp;

    @Test
    void aHandleKeepsItsViewThroughAnImportAndTheViewNoticesIt() throws Exception {
        Path cat = CliRun.examples(tmp.resolve("cat"));
        Path more = tmp.resolve("more.csv");
        Files.writeString(more, "part_number,maker,technology,channel,v_block_v,v_gs_max_v,v_gs_min_v,q_g_nc\n"
                + "HDL-NEW1,Handle Test,si-mosfet,n,100,20,-20,30\n");
        Catalog view = Catalog.openIfPresent(cat);
        Catalog handle = view.handle();
        int before = handle.count(Kind.SWITCH);
        String name = handle.contentSha256();
        assertTrue(name.matches("[0-9a-f]{64}"), name);
        assertTrue(view.isCurrent());
        assertEquals(ExitCode.OK, CliRun.on(cat, "import", "--kind", "switch", more.toString()).exit());
        assertFalse(view.isCurrent(), "the view sees that another import committed");
        view.close();
        assertEquals(before, handle.count(Kind.SWITCH), "the handle still reads its own commit after the view closed");
        assertTrue(handle.get(Kind.SWITCH, "HDL-NEW1").isEmpty());
        // The import removed the old commit's files from the folder; the handle's report header still
        // names its own commit (a server answering from it must not fail as "damaged", as it once did).
        assertEquals(name, handle.contentSha256());
        try (Catalog now = Catalog.open(cat)) {
            assertFalse(name.equals(now.contentSha256()), "the new commit has its own name");
        }
        handle.close();
        handle.close(); // a second close is harmless
        try (Catalog now = Catalog.open(cat)) {
            assertEquals(before + 1, now.count(Kind.SWITCH));
            assertTrue(now.isCurrent());
        }
    }

    @Test
    void anEmptyFolderHasNoHandleAndIsNoLongerCurrentOnceImported() throws Exception {
        Path cat = tmp.resolve("empty");
        try (Catalog view = Catalog.openIfPresent(cat)) {
            assertThrows(CatalogFormatException.class, view::handle);
            assertTrue(view.isCurrent());
            CliRun.examples(cat);
            assertFalse(view.isCurrent());
        }
    }
}
