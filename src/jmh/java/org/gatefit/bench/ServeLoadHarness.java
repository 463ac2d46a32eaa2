package org.gatefit.bench;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.Writer;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.security.MessageDigest;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicLong;
import java.util.stream.Stream;
import org.gatefit.synth.BenchCatalogs;

/**
 * A load test of {@code gatefit serve}, not a benchmark with a verdict: many clients on loopback ask
 * shortlists of a synthetic catalog while another process imports a changed copy of the drivers
 * into the server's catalog folder. Three kinds of process: this one (the clients, Java's
 * {@link HttpClient}, one thread a client), the server ({@code java -jar gatefit.jar serve --port 0})
 * and the import ({@code java -jar gatefit.jar import …}, started after a warm-up).
 *
 * <p>The changed catalog is the same drivers again plus one more, {@code TST-DNEW0001}, a copy of
 * the best driver of the first question, so each question's answer differs between the old and the
 * new catalog (one more driver evaluated; in the first, the new driver listed), which is checked. Every response body is kept by
 * its SHA-256 and, at the end, compared with each question's answer from the old catalog (asked
 * before the load) and from the new one (asked after the import): a body equal to neither is a
 * mix, and a client that sees the new catalog and then the old one again is a step back. Both
 * must be zero, as must errors (anything but 200, or no answer); the harness then exits 0.
 *
 * <p>Arguments: clients (default 16), drivers (default 100,000), seconds of load before the import
 * (default 10), seconds after it (default 5), the jar (default {@code target/gatefit.jar}, built by
 * {@code mvn -q -DskipTests package}). Run from the project folder after {@code mvn -q -P bench package}:
 * {@code java -cp target/benchmarks.jar org.gatefit.bench.ServeLoadHarness 16 100000}.
 */
public final class ServeLoadHarness {
    private ServeLoadHarness() {
    }

    static final String NEW_DRIVER = "TST-DNEW0001";

    /** The questions, as API query strings: ShortlistBench's question (48 V first) and at three other bus voltages. */
    static final List<String> QUESTIONS = Stream.of("48", "24", "80", "100").map(bus ->
            "/api/v1/shortlist?switch=TST-S0000000&side=high&bus=" + bus
                    + "&freq=100k&rg=15&rg-off=0.5&edge=100&duty-max=0.6&drive=12&top=10").toList();

    public static void main(String[] args) throws Exception {
        int clients = args.length > 0 ? Integer.parseInt(args[0]) : 16;
        long drivers = args.length > 1 ? Long.parseLong(args[1]) : 100_000;
        int before = args.length > 2 ? Integer.parseInt(args[2]) : 10;
        int after = args.length > 3 ? Integer.parseInt(args[3]) : 5;
        Path jar = Path.of(args.length > 4 ? args[4] : "target/gatefit.jar").toAbsolutePath();
        if (!Files.isRegularFile(jar)) {
            throw new IllegalStateException(jar + " is missing: build it with 'mvn -q -DskipTests package' first");
        }
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();

        Path base = BenchCatalogs.catalog(100, drivers);
        Path work = Files.createTempDirectory(BenchCatalogs.root(), "serve-load-");
        Path catalog = work.resolve("catalog");
        copy(base, catalog);

        Process server = new ProcessBuilder(java, "-jar", jar.toString(), "serve", "--catalog", catalog.toString(),
                "--port", "0").redirectErrorStream(true).start();
        int exit;
        try {
            BufferedReader lines = new BufferedReader(new InputStreamReader(server.getInputStream(),
                    StandardCharsets.UTF_8));
            String first = lines.readLine();
            if (first == null || !first.startsWith("gatefit serve: http://")) {
                throw new IllegalStateException("the server did not start: " + first);
            }
            String url = first.substring("gatefit serve: ".length(), first.indexOf('/', "gatefit serve: http://".length()));
            Thread drain = new Thread(() -> lines.lines().forEach(l -> { }), "server-output");
            drain.setDaemon(true);
            drain.start();

            HttpClient http = HttpClient.newBuilder().connectTimeout(Duration.ofSeconds(10)).build();
            List<String> oldAnswers = new ArrayList<>();
            for (String q : QUESTIONS) {
                oldAnswers.add(ask(http, url + q));
            }
            Path changed = work.resolve("drivers-changed.csv");
            String best = bestDriver(oldAnswers.get(0));
            writeChanged(BenchCatalogs.driversCsv(drivers), changed, best);

            System.out.printf("gatefit serve load: %d clients, %,d drivers, %d processors, %s; server %s%n",
                    clients, drivers, Runtime.getRuntime().availableProcessors(), load(), url);
            Run run = new Run(http, url, clients);
            run.start();
            Thread.sleep(before * 1000L);
            long importStart = System.nanoTime();
            Process imp = new ProcessBuilder(java, "-XX:+UseParallelGC", "-jar", jar.toString(), "import",
                    "--catalog", catalog.toString(), changed.toString())
                    .redirectErrorStream(true).redirectOutput(work.resolve("import.log").toFile()).start();
            int importExit = imp.waitFor();
            long importEnd = System.nanoTime();
            if (importExit != 0) {
                run.stop();
                throw new IllegalStateException("the import failed (exit " + importExit + "): "
                        + Files.readString(work.resolve("import.log")));
            }
            Thread.sleep(after * 1000L);
            run.stop();
            long end = System.nanoTime();

            List<String> newAnswers = new ArrayList<>();
            for (String q : QUESTIONS) {
                newAnswers.add(ask(http, url + q));
            }
            report(run, oldAnswers, newAnswers, importStart, importEnd, end);
            boolean ok = run.errors.get() == 0 && run.mixed.get() == 0 && run.stepsBack.get() == 0
                    && run.sawNew.get() > 0;
            for (int i = 0; i < QUESTIONS.size(); i++) {
                // Each question must tell the catalogs apart, or "old or new" would prove nothing.
                boolean apart = !oldAnswers.get(i).equals(newAnswers.get(i)) && !oldAnswers.get(i).contains(NEW_DRIVER)
                        && (i > 0 || newAnswers.get(i).contains(NEW_DRIVER));
                if (!apart) {
                    System.out.println("question " + QUESTIONS.get(i) + " gives the same answer from both catalogs");
                }
                ok &= apart;
            }
            System.out.println(ok ? "OK: no errors, every answer from the old or the new catalog"
                    : "FAILED: see the counts above");
            Files2.delete(work);
            exit = ok ? 0 : 1;
        } finally {
            // Before exiting: System.exit in the try would skip this and leave the server running.
            server.destroy();
            server.waitFor(10, TimeUnit.SECONDS);
        }
        System.exit(exit);
    }

    /** The clients: each asks the questions in turn, as fast as answers come, and keeps what it saw. */
    static final class Run {
        final HttpClient http;
        final String url;
        final Thread[] threads;
        final AtomicBoolean stopping = new AtomicBoolean();
        final AtomicLong errors = new AtomicLong();
        final AtomicLong mixed = new AtomicLong();
        final AtomicLong stepsBack = new AtomicLong();
        final AtomicLong sawNew = new AtomicLong();
        /** Every distinct body by question and digest, and how often it came. */
        final Map<String, AtomicLong> bodies = new ConcurrentHashMap<>();
        final Map<String, String> firstError = new ConcurrentHashMap<>();
        /** Per client: start time, latency (ns) and body digest of each answer. */
        final List<List<long[]>> timings = new ArrayList<>();
        final List<List<String>> seen = new ArrayList<>();
        long start;

        Run(HttpClient http, String url, int clients) {
            this.http = http;
            this.url = url;
            this.threads = new Thread[clients];
            for (int c = 0; c < clients; c++) {
                List<long[]> t = new ArrayList<>();
                List<String> s = new ArrayList<>();
                timings.add(t);
                seen.add(s);
                int client = c;
                threads[c] = new Thread(() -> {
                    int i = client;
                    while (!stopping.get()) {
                        int q = i++ % QUESTIONS.size();
                        long t0 = System.nanoTime();
                        String digest;
                        try {
                            HttpResponse<byte[]> r = http.send(HttpRequest.newBuilder(URI.create(url + QUESTIONS.get(q)))
                                    .timeout(Duration.ofSeconds(120)).build(), HttpResponse.BodyHandlers.ofByteArray());
                            if (r.statusCode() != 200) {
                                errors.incrementAndGet();
                                firstError.putIfAbsent("status", r.statusCode() + " " + new String(r.body(),
                                        StandardCharsets.UTF_8));
                                digest = "error";
                            } else {
                                digest = q + ":" + sha(r.body());
                                bodies.computeIfAbsent(digest, k -> new AtomicLong()).incrementAndGet();
                            }
                        } catch (IOException | InterruptedException e) {
                            errors.incrementAndGet();
                            firstError.putIfAbsent("exception", e.toString());
                            digest = "error";
                        }
                        t.add(new long[] {t0, System.nanoTime() - t0});
                        s.add(digest);
                    }
                }, "client-" + c);
            }
        }

        void start() {
            start = System.nanoTime();
            for (Thread t : threads) {
                t.start();
            }
        }

        void stop() throws InterruptedException {
            stopping.set(true);
            for (Thread t : threads) {
                t.join();
            }
        }
    }

    static void report(Run run, List<String> oldAnswers, List<String> newAnswers, long importStart, long importEnd,
                       long end) throws Exception {
        List<String> oldDigests = new ArrayList<>();
        List<String> newDigests = new ArrayList<>();
        for (int q = 0; q < QUESTIONS.size(); q++) {
            oldDigests.add(q + ":" + sha(oldAnswers.get(q).getBytes(StandardCharsets.UTF_8)));
            newDigests.add(q + ":" + sha(newAnswers.get(q).getBytes(StandardCharsets.UTF_8)));
        }
        long fromOld = 0;
        long fromNew = 0;
        for (Map.Entry<String, AtomicLong> b : run.bodies.entrySet()) {
            if (oldDigests.contains(b.getKey())) {
                fromOld += b.getValue().get();
            } else if (newDigests.contains(b.getKey())) {
                fromNew += b.getValue().get();
            } else {
                run.mixed.addAndGet(b.getValue().get());
            }
        }
        run.sawNew.set(fromNew);
        long firstNew = Long.MAX_VALUE;
        for (int c = 0; c < run.seen.size(); c++) {
            boolean newer = false;
            List<String> s = run.seen.get(c);
            for (int i = 0; i < s.size(); i++) {
                if (newDigests.contains(s.get(i))) {
                    newer = true;
                    firstNew = Math.min(firstNew, run.timings.get(c).get(i)[0] + run.timings.get(c).get(i)[1]);
                } else if (newer && oldDigests.contains(s.get(i))) {
                    run.stepsBack.incrementAndGet();
                }
            }
        }
        List<long[]> all = new ArrayList<>();
        run.timings.forEach(all::addAll);
        double seconds = (end - run.start) / 1e9;
        System.out.printf("%,d answers in %.1f s: %,.0f requests/s; latency %s%n", all.size(), seconds,
                all.size() / seconds, percentiles(all, Long.MIN_VALUE, Long.MAX_VALUE));
        System.out.printf("  before the import: %s%n", percentiles(all, Long.MIN_VALUE, importStart));
        System.out.printf("  while it ran (%.1f s): %s%n", (importEnd - importStart) / 1e9,
                percentiles(all, importStart, importEnd));
        System.out.printf("  after it committed: %s%n", percentiles(all, importEnd, Long.MAX_VALUE));
        System.out.printf("errors %d%s; answers from the old catalog %,d, from the new %,d, neither (a mix) %d;"
                + " a client back from new to old %d times%n", run.errors.get(),
                run.firstError.isEmpty() ? "" : " (first: " + run.firstError + ")", fromOld, fromNew, run.mixed.get(),
                run.stepsBack.get());
        if (firstNew != Long.MAX_VALUE) {
            System.out.printf("first answer from the new catalog %.2f s after the import process ended; %s%n",
                    (firstNew - importEnd) / 1e9, load());
        }
    }

    /** Requests, p50, p99 and the largest latency of answers asked between {@code from} and {@code to}. */
    static String percentiles(List<long[]> all, long from, long to) {
        long[] l = all.stream().filter(t -> t[0] >= from && t[0] < to).mapToLong(t -> t[1]).sorted().toArray();
        if (l.length == 0) {
            return "no answers";
        }
        return String.format("%,d answers, p50 %.1f ms, p99 %.1f ms, max %.1f ms", l.length, l[l.length / 2] / 1e6,
                l[Math.min(l.length - 1, (int) Math.ceil(l.length * 0.99) - 1)] / 1e6, l[l.length - 1] / 1e6);
    }

    static String ask(HttpClient http, String uri) throws Exception {
        HttpResponse<String> r = http.send(HttpRequest.newBuilder(URI.create(uri)).timeout(Duration.ofSeconds(120))
                .build(), HttpResponse.BodyHandlers.ofString());
        if (r.statusCode() != 200) {
            throw new IllegalStateException(uri + ": " + r.statusCode() + " " + r.body());
        }
        return r.body();
    }

    /** The first candidate's part number in a shortlist's JSON. */
    static String bestDriver(String json) {
        int c = json.indexOf("\"candidates\"");
        int d = json.indexOf("\"driver\" : \"", c);
        if (c < 0 || d < 0) {
            throw new IllegalStateException("no candidate in the first question's answer: " + json);
        }
        d += "\"driver\" : \"".length();
        return json.substring(d, json.indexOf('"', d));
    }

    /** The drivers again, plus a copy of {@code best} named {@link #NEW_DRIVER}. */
    static void writeChanged(Path drivers, Path changed, String best) throws IOException {
        List<String> lines = Files.readAllLines(drivers, StandardCharsets.UTF_8);
        if (!lines.get(0).startsWith("part_number,")) {
            throw new IllegalStateException("expected part_number first in " + drivers);
        }
        String copy = lines.stream().filter(l -> l.startsWith(best + ",")).findFirst().orElseThrow()
                .replaceFirst("^[^,]+", NEW_DRIVER);
        try (Writer w = Files.newBufferedWriter(changed, StandardCharsets.UTF_8)) {
            for (String l : lines) {
                w.write(l);
                w.write('\n');
            }
            w.write(copy);
            w.write('\n');
        }
    }

    static void copy(Path from, Path to) throws IOException {
        Files.createDirectories(to);
        try (Stream<Path> s = Files.list(from)) {
            for (Path p : s.toList()) {
                if (!p.getFileName().toString().equals("complete")) {
                    Files.copy(p, to.resolve(p.getFileName()), StandardCopyOption.COPY_ATTRIBUTES);
                }
            }
        }
    }

    /**
     * The answer's digest, without the report header's time ({@code report.generated}), which
     * differs from answer to answer; the header's catalog content hash stays in: it names the
     * catalog the answer came from.
     */
    static String sha(byte[] b) {
        byte[] timeless = GENERATED.matcher(new String(b, StandardCharsets.UTF_8)).replaceAll("").getBytes(StandardCharsets.UTF_8);
        try {
            return HexFormat.of().formatHex(Arrays.copyOf(MessageDigest.getInstance("SHA-256").digest(timeless), 12));
        } catch (java.security.NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }

    private static final java.util.regex.Pattern GENERATED = java.util.regex.Pattern.compile("\"generated\"\\s*:\\s*\"[^\"]*\"");

    static String load() {
        try {
            return "load average " + Files.readString(Path.of("/proc/loadavg")).split(" ")[0];
        } catch (IOException e) {
            return "load average unknown";
        }
    }
}
