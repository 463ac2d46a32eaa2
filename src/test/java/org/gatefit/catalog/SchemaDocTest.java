package org.gatefit.catalog;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/** catalog-schema/README.md must show exactly the columns the schema files define. */
class SchemaDocTest {

    @ParameterizedTest
    @EnumSource(Kind.class)
    void readmeTableMatchesTheSchemaFile(Kind kind) throws IOException {
        String readme = Files.readString(Path.of("catalog-schema", "README.md"), StandardCharsets.UTF_8);
        String begin = "<!-- columns:" + kind.id() + " begin -->\n";
        String end = "<!-- columns:" + kind.id() + " end -->";
        int b = readme.indexOf(begin);
        int e = readme.indexOf(end);
        assertTrue(b >= 0 && e > b, "catalog-schema/README.md lacks the markers " + begin.strip() + " … " + end);
        String shown = readme.substring(b + begin.length(), e);
        assertEquals(SchemaDoc.table(kind), shown,
                "catalog-schema/README.md's " + kind + " table differs from " + kind.id() + ".schema.json;"
                        + " replace it with the expected text");
    }

    @ParameterizedTest
    @EnumSource(Kind.class)
    void everyRequiredColumnOfTheSchemaIsMarkedRequiredInTheTable(Kind kind) {
        String table = SchemaDoc.table(kind);
        for (String r : Schema.of(kind).requiredNames()) {
            assertTrue(table.contains("| `" + r + "` | "), r);
            assertTrue(table.lines().anyMatch(l -> l.startsWith("| `" + r + "` |") && l.contains("| yes |")), r);
        }
    }
}
