package org.gatefit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

/**
 * Issue 14, finding 8: text holding characters XML 1.0 forbids (§2.2: U+FFFE, U+FFFF, controls
 * other than tab, line feed and carriage return) still gives a well-formed JUnit-XML file (the
 * JDK's XML parser reads it) and an HTML page without them. Invented parts (CheckFixture).
 */
class XmlCharsTest {
    /** A stage id and switch cell with forbidden characters; UTF-8 holds them all (EF BF BE, EF BF BF, 01, 1F). */
    static final String STAGE = "S\uFFFE\uFFFF\u0001\u001F-1";

    @TempDir
    Path tmp;
    Path catalog;
    Path sheet;

    @BeforeEach
    void sheet() throws Exception {
        catalog = CheckFixture.importCatalog(tmp);
        sheet = CheckFixture.write(tmp.resolve("stages.csv"), CheckFixture.STAGE_HEADER
                + CheckFixture.baseline(STAGE, "TST-DRV1", "TST-SW1\uFFFF")
                + CheckFixture.baseline("PASS-1", "TST-DRV1", "TST-SW1"));
    }

    @Test
    void junitXmlParsesAndHoldsTheTextWithoutTheForbiddenCharacters() throws Exception {
        Path xml = tmp.resolve("check.xml");
        CliRun r = CliRun.on(catalog, "check", sheet.toString(), "--junit", xml.toString());
        assertEquals(ExitCode.FAILED, r.exit(), r.dump());
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
        Document doc;
        try (InputStream in = Files.newInputStream(xml)) {
            doc = f.newDocumentBuilder().parse(in); // throws on a character XML forbids
        }
        NodeList cases = doc.getElementsByTagName("testcase");
        List<String> classes = new ArrayList<>();
        for (int i = 0; i < cases.getLength(); i++) {
            classes.add(((Element) cases.item(i)).getAttribute("classname"));
        }
        assertTrue(classes.contains("stage.S-1"), classes.toString());
        assertTrue(Files.readString(xml).contains("TST-SW1 "), "the switch's name without U+FFFF");
    }

    @Test
    void theHtmlReportHasNoCharacterXmlForbids() throws Exception {
        Path html = tmp.resolve("check.html");
        CliRun r = CliRun.on(catalog, "check", sheet.toString(), "--format", "html", "--output", html.toString());
        assertEquals(ExitCode.FAILED, r.exit(), r.dump());
        String page = Files.readString(html, StandardCharsets.UTF_8);
        assertTrue(page.contains("S-1"), "the stage is listed");
        for (int i = 0; i < page.length(); i++) {
            char c = page.charAt(i);
            boolean allowed = c == '\t' || c == '\n' || c == '\r' || c >= 0x20 && c <= 0xFFFD
                    && !Character.isSurrogate(c) || Character.isSurrogate(c);
            assertTrue(allowed, "U+" + Integer.toHexString(c).toUpperCase() + " at " + i);
        }
    }
}
