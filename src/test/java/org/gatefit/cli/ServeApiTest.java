package org.gatefit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.ByteArrayOutputStream;
import java.net.URI;
import java.net.URLEncoder;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.gatefit.report.Caution;
import org.gatefit.serve.Server;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code gatefit serve}'s API over the example catalog: every endpoint's JSON is the command line's
 * {@code --format json} for the same question (run in-process with {@link CliRun}), and bad input,
 * unknown parts and refused requests get the documented status and message.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class ServeApiTest {
    static final ObjectMapper JSON = new ObjectMapper();

    Path cat;
    Server server;
    HttpClient http = HttpClient.newBuilder().connectTimeout(Duration.ofSeconds(10)).build();

    @BeforeAll
    void start(@TempDir Path tmp) throws Exception {
        cat = CliRun.examples(tmp.resolve("cat"));
        server = Server.start(new Server.Settings("127.0.0.1", 0, cat, "t0ken", 1 << 20, Duration.ofSeconds(60), 4),
                new Answers(cat, CliRun.CLOCK));
    }

    @AfterAll
    void stop() throws Exception {
        server.close();
    }

    HttpResponse<String> get(String path) throws Exception {
        return http.send(HttpRequest.newBuilder(URI.create(server.url() + path.substring(1))).build(),
                HttpResponse.BodyHandlers.ofString());
    }

    /** The CLI's JSON for the same question, which must succeed. */
    JsonNode cli(String... args) throws Exception {
        List<String> all = new ArrayList<>(List.of(args));
        all.addAll(List.of("--format", "json"));
        CliRun r = CliRun.on(cat, all.toArray(String[]::new));
        assertTrue(r.exit() == 0 || r.exit() == 1, r.dump());
        return JSON.readTree(r.out());
    }

    void same(String path, String... args) throws Exception {
        HttpResponse<String> r = get(path);
        assertEquals(200, r.statusCode(), path + ": " + r.body());
        assertTrue(r.headers().firstValue("Content-Type").orElse("").startsWith("application/json"), path);
        assertEquals(cli(args), JSON.readTree(r.body()), path);
    }

    static String q(String s) {
        return URLEncoder.encode(s, StandardCharsets.UTF_8);
    }

    @Test
    void shortlistExplainFindShowReplaceAnswerAsTheCommandLine() throws Exception {
        same("/api/v1/shortlist?switch=QND-65G150D&side=high&bus=48&freq=100k&edge=50ns&drive=6&all=true",
                "shortlist", "--switch", "QND-65G150D", "--side", "high", "--bus", "48", "--freq", "100k", "--edge",
                "50ns", "--drive", "6", "--all");
        same("/api/v1/shortlist?switch=CVL-1025TL&freq=20&bus=48&top=3&margin=drive-current=2&margin=offset=0.3"
                + "&drive-neg=-0.5&in-stock=true&all=false",
                "shortlist", "--switch", "CVL-1025TL", "--freq", "20", "--bus", "48", "--top", "3", "--margin",
                "drive-current=2", "--margin", "offset=0.3", "--drive-neg", "-0.5", "--in-stock");
        same("/api/v1/explain?driver=QND-D06L&switch=QND-65G150D&freq=200&bus=375&rg=4.7",
                "explain", "--driver", "QND-D06L", "--switch", "QND-65G150D", "--freq", "200", "--bus", "375",
                "--rg", "4.7");
        same("/api/v1/find?words=" + q("gate driver") + "&where=" + q("i_sink_a >= 4 A") + "&sort=i_sink_a:desc"
                + "&limit=5", "find", "gate", "driver", "--where", "i_sink_a >= 4 A", "--sort", "i_sink_a:desc",
                "--limit", "5");
        same("/api/v1/find?kind=switch&where=" + q("technology = gan-hemt") + "&where=" + q("v_block_v >= 650"),
                "find", "--kind", "switch", "--where", "technology = gan-hemt", "--where", "v_block_v >= 650");
        same("/api/v1/parts/switch/QND-65G150D", "show", "--kind", "switch", "QND-65G150D");
        same("/api/v1/replace?part=CVL-1025TL&top=4", "replace", "CVL-1025TL", "--top", "4");
    }

    @Test
    void explainCarriesTheGateWaveformsThePairPagePlots() throws Exception {
        HttpResponse<String> r = get("/api/v1/explain?driver=QND-D06L&switch=QND-65G150D&freq=200&bus=375&drive=6"
                + "&drive-neg=-3");
        assertEquals(200, r.statusCode(), r.body());
        JsonNode w = JSON.readTree(r.body()).get("waveforms");
        double plateau = JSON.readTree(get("/api/v1/parts/switch/QND-65G150D").body()).get("v_plateau_v").asDouble();
        // The gate charges from one drive level toward the other and sits at the Miller plateau in
        // between (the three-phase picture of Mohan, Undeland, Robbins, Power Electronics, 3rd ed.).
        for (String edge : List.of("turn_on", "turn_off")) {
            JsonNode e = w.get(edge);
            JsonNode t = e.get("time_s");
            JsonNode v = e.get("v_gs_v");
            assertEquals(t.size(), v.size(), edge);
            assertEquals(t.size(), e.get("i_g_a").size(), edge);
            boolean on = edge.equals("turn_on");
            assertEquals(on ? -3 : 6, v.get(0).asDouble(), 1e-9, edge + " starts at the level it leaves");
            assertEquals(on ? 6 : -3, v.get(v.size() - 1).asDouble(), 0.5, edge + " ends near the level it drives to");
            double mid = (e.get("plateau_start_s").asDouble() + e.get("plateau_end_s").asDouble()) / 2;
            int k = 0;
            while (t.get(k).asDouble() < mid) {
                k++;
            }
            assertEquals(plateau, v.get(k).asDouble(), 1e-3, edge + " on the plateau at " + mid + " s");
        }
    }

    /**
     * The design page links a bridge stage to the pair page with its partner's edge ({@code twin-edge},
     * from check's {@code operating_point.twin}): the explain API then answers as the command line
     * with {@code --twin-edge}, and its dv-dt check is the one check gave the stage (GC-CLAMP of the
     * example, judged on GC-MAIN's turn-on; a stage of unlike halves).
     */
    @Test
    void explainTakesThePartnersEdgeSoThePairPageJudgesAsCheck() throws Exception {
        CliRun c = CliRun.on(cat, "check", Project.file("examples/stages.csv").toString(), "--bom",
                Project.file("examples/bom.csv").toString(), "--format", "json");
        JsonNode stage = null;
        for (JsonNode s : JSON.readTree(c.out()).get("results")) {
            if (s.get("stage").asText().equals("GC-CLAMP")) {
                stage = s;
            }
        }
        JsonNode t = stage.get("operating_point").get("twin");
        String edge = t.get("name").asText() + "=" + t.get("dv_dt_25c_v_per_ns").asText() + ","
                + t.get("dv_dt_tj_v_per_ns").asText();
        // GC-CLAMP's row of examples/stages.csv as parameters.
        String point = "&side=high&bus=375&freq=200&edge=10&drive=6&drive-neg=0&v-oh=4.6&v-ol=0.2&pwm=active-high"
                + "&rg=10&rg-off=0.5&duty-max=0.6&parallel=1&loop=4&bridge=yes&tj=125";
        String path = "/api/v1/explain?driver=" + stage.get("driver").asText() + "&switch=" + stage.get("switch").asText()
                + point + "&twin-edge=" + q(edge);
        same(path, "explain", "--driver", stage.get("driver").asText(), "--switch", stage.get("switch").asText(),
                "--side", "high", "--bus", "375", "--freq", "200", "--edge", "10", "--drive", "6", "--drive-neg", "0",
                "--v-oh", "4.6", "--v-ol", "0.2", "--pwm", "active-high", "--rg", "10", "--rg-off", "0.5", "--duty-max",
                "0.6", "--parallel", "1", "--loop", "4", "--bridge", "yes", "--tj", "125", "--twin-edge", edge);
        JsonNode api = JSON.readTree(get(path).body());
        JsonNode want = null;
        for (JsonNode ch : stage.get("checks")) {
            if (ch.get("rule").asText().equals("dv-dt")) {
                want = ch;
            }
        }
        JsonNode got = null;
        for (JsonNode ch : api.get("checks")) {
            if (ch.get("rule").asText().equals("dv-dt")) {
                got = ch;
            }
        }
        assertEquals(want.get("verdict"), got.get("verdict"));
        assertEquals(want.get("message"), got.get("message"));
        assertTrue(got.get("message").asText().contains("(GC-MAIN's turn-on)"), got.toString());
    }

    @Test
    void theWebJarsArePartOfTheServer() throws Exception {
        HttpResponse<String> js = get("/webjars/uplot/1.6.30/dist/uPlot.iife.min.js");
        assertEquals(200, js.statusCode());
        assertTrue(js.headers().firstValue("Content-Type").orElse("").contains("javascript"), js.headers().toString());
        assertTrue(js.headers().firstValue("Content-Security-Policy").orElse("").startsWith("default-src 'self'"),
                "the same headers as every answer");
        assertEquals(200, get("/webjars/uplot/1.6.30/dist/uPlot.min.css").statusCode());
        String page = get("/pair").body();
        assertTrue(page.contains("src=\"/webjars/uplot/1.6.30/dist/uPlot.iife.min.js\""), "the page names the served file");
    }

    @Test
    void checkTakesTheStageSheetAndBomAsMultipartFields() throws Exception {
        Path stages = Project.file("examples/stages.csv");
        Path bom = Project.file("examples/bom.csv");
        HttpResponse<String> r = post("/api/v1/check", List.of(new Part("stages", "stages.csv", Files.readAllBytes(stages)),
                new Part("bom", "bom.csv", Files.readAllBytes(bom))), Map.of());
        assertEquals(200, r.statusCode(), r.body());
        // The CLI run in the examples folder, so both name the files as given: stages.csv, bom.csv.
        CliRun c = cliIn(stages.getParent(), "check", "stages.csv", "--bom", "bom.csv", "--format", "json");
        assertEquals(JSON.readTree(c.out()), JSON.readTree(r.body()));
        assertEquals(Integer.toString(c.exit()), r.headers().firstValue("Gatefit-Exit-Code").orElseThrow(),
                "a failing stage is a result (200), its exit code in a header");

        HttpResponse<String> junit = post("/api/v1/check?format=junit", List.of(new Part("stages", "stages.csv",
                Files.readAllBytes(stages)), new Part("bom", "bom.csv", Files.readAllBytes(bom))), Map.of());
        assertEquals(200, junit.statusCode(), junit.body());
        assertTrue(junit.body().startsWith("<?xml") && junit.body().contains("<testsuite"), junit.body());
    }

    @Test
    void replaceTakesTheStagesToRecheckAsMultipartFields() throws Exception {
        Path stages = Project.file("examples/stages.csv");
        Path bom = Project.file("examples/bom.csv");
        HttpResponse<String> r = post("/api/v1/replace?part=CVL-1025TL&top=3", List.of(new Part("stages", "stages.csv",
                Files.readAllBytes(stages)), new Part("bom", "bom.csv", Files.readAllBytes(bom))), Map.of());
        assertEquals(200, r.statusCode(), r.body());
        CliRun c = cliIn(stages.getParent(), "replace", "CVL-1025TL", "--stages", "stages.csv", "--bom", "bom.csv",
                "--top", "3", "--format", "json");
        assertEquals(0, c.exit(), c.dump());
        JsonNode api = JSON.readTree(r.body());
        assertEquals(JSON.readTree(c.out()), api);
        assertTrue(api.get("stages").size() > 0, "the stages that use the part were re-checked: " + r.body());
    }

    /** The CLI with relative paths resolved in {@code dir}, as the server resolves the posted files. */
    CliRun cliIn(Path dir, String... args) {
        java.io.StringWriter out = new java.io.StringWriter();
        java.io.StringWriter err = new java.io.StringWriter();
        List<String> all = new ArrayList<>(List.of("--catalog", cat.toString()));
        all.addAll(List.of(args));
        int code = Cli.create(new java.io.PrintWriter(out, true), new java.io.PrintWriter(err, true), Map.of(),
                CliRun.CLOCK, false, dir).execute(all.toArray(String[]::new));
        return new CliRun(code, out.toString(), err.toString());
    }

    @Test
    void unknownPartIs404WithTheNearestPartNumbers() throws Exception {
        HttpResponse<String> r = get("/api/v1/shortlist?switch=QND-65G15&freq=200");
        assertEquals(404, r.statusCode());
        JsonNode e = JSON.readTree(r.body());
        assertEquals("not found", e.get("error").asText());
        CliRun c = CliRun.on(cat, "shortlist", "--switch", "QND-65G15", "--freq", "200");
        assertEquals(c.err().strip(), e.get("message").asText(), "the CLI's own message");
        assertTrue(e.get("message").asText().contains("nearest: QND-65G150D"), r.body());
        assertEquals(404, get("/api/v1/parts/driver/NOPE-1").statusCode());
        assertEquals(404, get("/api/v1/replace?part=NOPE-1").statusCode());
    }

    @Test
    void badValuesAndUnknownParametersAre400WithTheReason() throws Exception {
        HttpResponse<String> bad = get("/api/v1/shortlist?switch=QND-65G150D&freq=200&rg=4,7");
        assertEquals(400, bad.statusCode());
        CliRun c = CliRun.on(cat, "shortlist", "--switch", "QND-65G150D", "--freq", "200", "--rg", "4,7");
        assertEquals(ExitCode.USAGE, c.exit());
        assertEquals(c.err().strip(), JSON.readTree(bad.body()).get("message").asText());
        assertEquals("usage", JSON.readTree(bad.body()).get("error").asText());

        HttpResponse<String> missing = get("/api/v1/shortlist?switch=QND-65G150D");
        assertEquals(400, missing.statusCode());
        assertTrue(JSON.readTree(missing.body()).get("message").asText().contains("--freq"), missing.body());

        HttpResponse<String> unknown = get("/api/v1/shortlist?swich=QND-65G150D&freq=200");
        assertEquals(400, unknown.statusCode());
        assertTrue(unknown.body().contains("unknown parameter 'swich' (did you mean 'switch'?)"), unknown.body());
        // The nearest accepted name by edit distance: a letter dropped, doubled, swapped, or a case slip.
        for (String[] typo : new String[][] {{"bsu", "bus"}, {"freqq", "freq"}, {"drive-ng", "drive-neg"},
                {"Top", "top"}}) {
            HttpResponse<String> r = get("/api/v1/shortlist?switch=QND-65G150D&freq=200&" + typo[0] + "=1");
            assertEquals(400, r.statusCode(), r.body());
            assertTrue(r.body().contains("(did you mean '" + typo[1] + "'?)"), typo[0] + ": " + r.body());
        }
        HttpResponse<String> far = get("/api/v1/shortlist?switch=QND-65G150D&freq=200&colour=red");
        assertFalse(far.body().contains("did you mean"), "nothing near: no guess: " + far.body());
        // Options that would touch the server's files are not parameters.
        for (String p : List.of("catalog=/tmp", "output=/tmp/x.json", "verbose=true")) {
            HttpResponse<String> r = get("/api/v1/find?" + p);
            assertEquals(400, r.statusCode(), p);
        }
        HttpResponse<String> flag = get("/api/v1/shortlist?switch=QND-65G150D&freq=200&all=maybe");
        assertEquals(400, flag.statusCode());

        HttpResponse<String> badSheet = post("/api/v1/check", List.of(new Part("stages", "mine.csv",
                "stage,driver,switch,side,bus_v,f_sw_khz,v_drive_v\nS1,VHM-4410N,CVL-1025TL,low,48,2O,12\n"
                        .getBytes(StandardCharsets.UTF_8))), Map.of());
        assertEquals(400, badSheet.statusCode(), badSheet.body());
        JsonNode e = JSON.readTree(badSheet.body());
        assertEquals("bad input", e.get("error").asText());
        assertTrue(e.get("message").asText().contains("mine.csv line 2"), badSheet.body());
    }

    @Test
    void crossSitePostsAndForeignHostsAreRefused() throws Exception {
        byte[] stages = Files.readAllBytes(Project.file("examples/stages.csv"));
        HttpResponse<String> r = post("/api/v1/check", List.of(new Part("stages", "stages.csv", stages)),
                Map.of("Origin", "http://evil.example"));
        assertEquals(403, r.statusCode(), r.body());
        HttpResponse<String> same = post("/api/v1/check", List.of(new Part("stages", "stages.csv", stages)),
                Map.of("Origin", server.url().replaceFirst("/$", "")));
        assertEquals(200, same.statusCode(), "own origin accepted: " + same.body());
        HttpResponse<String> site = post("/api/v1/check", List.of(new Part("stages", "stages.csv", stages)),
                Map.of("Sec-Fetch-Site", "cross-site"));
        assertEquals(403, site.statusCode());
    }

    @Test
    void importNeedsTheTokenAndTheViewFollowsImportsByOthers() throws Exception {
        byte[] sw = "part_number,maker,technology,channel,v_block_v,v_gs_max_v,v_gs_min_v,q_g_nc\nSRV-NEW1,Servo Test,si-mosfet,n,100,20,-20,30\n"
                .getBytes(StandardCharsets.UTF_8);
        HttpResponse<String> noToken = post("/api/v1/import?kind=switch", List.of(new Part("files", "new.csv", sw)),
                Map.of());
        assertEquals(401, noToken.statusCode(), noToken.body());
        assertEquals(404, get("/api/v1/parts/switch/SRV-NEW1").statusCode());

        HttpResponse<String> ok = post("/api/v1/import?kind=switch", List.of(new Part("files", "new.csv", sw)),
                Map.of("Authorization", "Bearer t0ken"));
        assertEquals(200, ok.statusCode(), ok.body());
        assertEquals(200, get("/api/v1/parts/switch/SRV-NEW1").statusCode(), "the web import is seen at once");

        // Another process's import (here the CLI writing the same folder) is picked up without a restart.
        Path more = cat.getParent().resolve("more.csv");
        Files.writeString(more, "part_number,maker,technology,channel,v_block_v,v_gs_max_v,v_gs_min_v,q_g_nc\n"
                + "SRV-NEW2,Servo Test,si-mosfet,n,100,20,-20,30\n");
        assertEquals(ExitCode.OK, CliRun.on(cat, "import", "--kind", "switch", more.toString()).exit());
        assertEquals(200, get("/api/v1/parts/switch/SRV-NEW2").statusCode());
    }

    @Test
    void openApiDocumentParsesAndNamesEveryRoute() throws Exception {
        HttpResponse<String> r = get("/api/v1/openapi.json");
        assertEquals(200, r.statusCode());
        JsonNode doc = JSON.readTree(r.body());
        assertTrue(doc.get("openapi").asText().startsWith("3."), "an OpenAPI 3 document");
        for (String p : List.of("/api/v1/shortlist", "/api/v1/explain", "/api/v1/find", "/api/v1/parts/{kind}/{part}",
                "/api/v1/replace", "/api/v1/check", "/api/v1/import")) {
            assertTrue(doc.get("paths").has(p), "documents " + p);
        }
        assertTrue(doc.get("paths").get("/api/v1/replace").has("post"), "documents POST /api/v1/replace");
        // Every explain parameter documented is one the command takes (named as its long option), and
        // the partner's edge the design page's links carry is among them.
        picocli.CommandLine.Model.CommandSpec explain = Cli.create(new java.io.PrintWriter(java.io.Writer.nullWriter()),
                new java.io.PrintWriter(java.io.Writer.nullWriter()), Map.of(), CliRun.CLOCK).getSubcommands()
                .get("explain").getCommandSpec();
        List<String> known = Answers.known(explain, "explain");
        List<String> documented = new ArrayList<>();
        for (JsonNode p : doc.get("paths").get("/api/v1/explain").get("get").get("parameters")) {
            documented.add(p.get("name").asText());
        }
        for (String name : documented) {
            assertTrue(known.contains(name) || name.equals("download"), "explain takes the documented " + name);
        }
        assertTrue(documented.contains("twin-edge"), documented.toString());
        // And the other way: every option of shortlist and explain that a question over HTTP can use
        // is documented (files on the server's disk, output files and terminal settings are not).
        List<String> notOverHttp = List.of("catalog", "output", "csv-style", "verbose", "help", "version", "stages",
                "stage", "bom", "map", "map-file", "encoding", "header-row", "sheet");
        for (String command : List.of("shortlist", "explain")) {
            picocli.CommandLine.Model.CommandSpec spec = Cli.create(new java.io.PrintWriter(java.io.Writer.nullWriter()),
                    new java.io.PrintWriter(java.io.Writer.nullWriter()), Map.of(), CliRun.CLOCK).getSubcommands()
                    .get(command).getCommandSpec();
            List<String> names = new ArrayList<>();
            for (JsonNode p : doc.get("paths").get("/api/v1/" + command).get("get").get("parameters")) {
                names.add(p.get("name").asText());
            }
            for (String option : Answers.known(spec, command)) {
                assertTrue(notOverHttp.contains(option) || names.contains(option),
                        "/api/v1/" + command + " documents --" + option + ": " + names);
            }
        }
    }

    @Test
    void everyPageCarriesTheCautionAndTheSameOriginPolicy() throws Exception {
        for (String p : List.of("/", "/part", "/switch", "/pair", "/design", "/replace")) {
            HttpResponse<String> r = get(p);
            assertEquals(200, r.statusCode(), p);
            assertTrue(r.body().contains(Caution.TEXT.replace("'", "&#39;")), p + " shows the caution");
            String csp = r.headers().firstValue("Content-Security-Policy").orElse("");
            assertTrue(csp.startsWith("default-src 'self'"), p + ": " + csp);
            assertFalse(r.body().matches("(?s).*(src|href)=\"(https?:)?//.*"), p + " loads nothing from elsewhere");
        }
    }

    record Part(String field, String file, byte[] content) {
    }

    HttpResponse<String> post(String path, List<Part> parts, Map<String, String> headers) throws Exception {
        String boundary = "gatefitBoundary7";
        ByteArrayOutputStream body = new ByteArrayOutputStream();
        for (Part p : parts) {
            body.writeBytes(("--" + boundary + "\r\nContent-Disposition: form-data; name=\"" + p.field()
                    + "\"; filename=\"" + p.file() + "\"\r\nContent-Type: text/csv\r\n\r\n").getBytes(StandardCharsets.UTF_8));
            body.writeBytes(p.content());
            body.writeBytes("\r\n".getBytes(StandardCharsets.UTF_8));
        }
        body.writeBytes(("--" + boundary + "--\r\n").getBytes(StandardCharsets.UTF_8));
        HttpRequest.Builder b = HttpRequest.newBuilder(URI.create(server.url() + path.substring(1)))
                .header("Content-Type", "multipart/form-data; boundary=" + boundary)
                .POST(HttpRequest.BodyPublishers.ofByteArray(body.toByteArray()));
        headers.forEach(b::header);
        return http.send(b.build(), HttpResponse.BodyHandlers.ofString());
    }

    static Clock clock() {
        return CliRun.CLOCK;
    }
}
