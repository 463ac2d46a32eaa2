package org.gatefit.match;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;

/** The README's table of replacement parameters must be the one the engine applies. */
class ReplacementDocTest {

    @Test
    void readmeParameterTableMatchesTheEngine() throws IOException {
        String readme = Files.readString(Path.of("README.md"), StandardCharsets.UTF_8);
        String begin = "<!-- replacement-parameters begin -->\n";
        String end = "\n<!-- replacement-parameters end -->";
        int b = readme.indexOf(begin);
        int e = readme.indexOf(end);
        assertTrue(b >= 0 && e > b, "README.md lacks the replacement-parameters markers");
        assertEquals(Replacement.parameterMarkdown().strip(), readme.substring(b + begin.length(), e).strip(),
                "README.md's replacement table differs from Replacement.parameterMarkdown(); paste the expected text");
    }
}
