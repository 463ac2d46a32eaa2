package org.gatefit.serve;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import io.javalin.Javalin;
import io.javalin.http.Context;
import io.javalin.http.UploadedFile;
import java.io.IOException;
import java.io.InputStream;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.net.InetAddress;
import java.net.URI;
import java.net.URLEncoder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import java.util.concurrent.ArrayBlockingQueue;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.Future;
import java.util.concurrent.RejectedExecutionException;
import java.util.concurrent.ThreadPoolExecutor;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import org.eclipse.jetty.http.HttpException;
import org.eclipse.jetty.server.HttpConnectionFactory;
import org.eclipse.jetty.server.ServerConnector;
import org.gatefit.index.Catalog;
import org.gatefit.report.Caution;

/**
 * {@code gatefit serve}: the pages and the JSON API over one catalog folder, on Javalin (Jetty).
 * Every question goes through {@link Questions}, which answers as the command line does; this class
 * adds only HTTP: routes, status codes, limits, and the headers that keep the pages to their own
 * origin.
 */
public final class Server implements AutoCloseable {
    /** The pages, by path: each is a resource {@code web/NAME.html} with the caution filled in. */
    static final Map<String, String> PAGES = Map.of("/", "catalog", "/part", "part", "/switch", "switch",
            "/pair", "pair", "/design", "design", "/replace", "replace");

    /** The header every response carries: scripts, styles, images and requests from this origin only. */
    static final String CSP = "default-src 'self'; script-src 'self'; style-src 'self'; img-src 'self' data:;"
            + " connect-src 'self'; object-src 'none'; base-uri 'none'; form-action 'self'; frame-ancestors 'none'";

    /** The downloaded HTML reports' own policy (as their meta tag): inline styles, no requests at all. */
    static final String REPORT_CSP = "default-src 'none'; style-src 'unsafe-inline'; img-src data:;"
            + " frame-ancestors 'self'";

    private static final JsonFactory JSON = new JsonFactory();

    /**
     * How the server runs.
     *
     * @param host            the address to bind (loopback unless told otherwise)
     * @param port            the port (0: any free one)
     * @param catalog         the catalog folder
     * @param importToken     the token a web import must carry; null: imports refused (read-only)
     * @param maxRequestBytes the largest request body accepted
     * @param timeout         how long one question may take before the answer is 503
     * @param workers         questions answered at once (more wait in a queue four times as long)
     * @param idleTimeout     how long a connection may send nothing (a slow or stalled client) before it
     *                        is closed
     */
    public record Settings(String host, int port, Path catalog, String importToken, long maxRequestBytes,
                           Duration timeout, int workers, Duration idleTimeout) {
        /** Connections idle this long are closed ({@link #idleTimeout}). */
        public static final Duration IDLE_TIMEOUT = Duration.ofSeconds(10);

        public Settings(String host, int port, Path catalog, String importToken, long maxRequestBytes,
                        Duration timeout, int workers) {
            this(host, port, catalog, importToken, maxRequestBytes, timeout, workers, IDLE_TIMEOUT);
        }

        public Settings {
            Objects.requireNonNull(host, "host");
            Objects.requireNonNull(catalog, "catalog");
            if (timeout.isNegative() || timeout.isZero() || idleTimeout.isNegative() || idleTimeout.isZero()) {
                throw new IllegalArgumentException("timeout, idleTimeout: expected more than 0, got " + timeout
                        + ", " + idleTimeout);
            }
            if (port < 0 || port > 65535) {
                throw new IllegalArgumentException("port: expected 0 to 65535, got " + port);
            }
            if (maxRequestBytes < 1024) {
                throw new IllegalArgumentException("maxRequestBytes: expected at least 1024, got " + maxRequestBytes);
            }
            if (workers < 1) {
                throw new IllegalArgumentException("workers: expected at least 1, got " + workers);
            }
        }
    }

    private final Settings settings;
    private final Questions questions;
    private final CatalogViews views;
    private final ThreadPoolExecutor pool;
    private final boolean loopback;
    private final CountDownLatch stopped = new CountDownLatch(1);
    private Javalin app;

    private Server(Settings settings, Questions questions) throws IOException {
        this.settings = settings;
        this.questions = questions;
        this.views = new CatalogViews(settings.catalog());
        this.pool = new ThreadPoolExecutor(settings.workers(), settings.workers(), 30, TimeUnit.SECONDS,
                new ArrayBlockingQueue<>(4 * settings.workers()), r -> {
                    Thread t = new Thread(r, "gatefit-question");
                    t.setDaemon(true);
                    return t;
                });
        this.loopback = InetAddress.getByName(settings.host()).isLoopbackAddress();
    }

    /** Starts a server; it runs until {@link #close}. */
    public static Server start(Settings settings, Questions questions) throws IOException {
        Server s = new Server(settings, questions);
        s.app = Javalin.create(config -> {
            config.startup.showJavalinBanner = false;
            // One connector of our own (Javalin then adds none), closing connections idle too long.
            config.jetty.addConnector((server, http) -> {
                ServerConnector c = new ServerConnector(server, new HttpConnectionFactory(http));
                c.setHost(settings.host());
                c.setPort(settings.port());
                c.setIdleTimeout(settings.idleTimeout().toMillis());
                return c;
            });
            config.http.maxRequestSize = settings.maxRequestBytes();
            config.jetty.multipartConfig.maxTotalRequestSize(settings.maxRequestBytes(), io.javalin.config.SizeUnit.BYTES);
            config.jetty.multipartConfig.maxFileSize(settings.maxRequestBytes(), io.javalin.config.SizeUnit.BYTES);
            // Browser libraries come as WebJars from Maven Central inside the jar, served from the
            // classpath (/webjars/NAME/VERSION/…); the pages load nothing from anywhere else.
            config.staticFiles.enableWebjars();
            config.routes.before(s::guard);
            for (Map.Entry<String, String> p : PAGES.entrySet()) {
                config.routes.get(p.getKey(), ctx -> s.page(ctx, p.getValue()));
            }
            config.routes.get("/static/{file}", s::staticFile);
            config.routes.get("/api/v1/openapi.json", ctx -> ctx.contentType("application/json; charset=utf-8")
                    .result(resource("openapi.json")));
            config.routes.get("/api/v1/about", s::about);
            for (String c : List.of("shortlist", "explain", "find", "replace")) {
                config.routes.get("/api/v1/" + c, ctx -> s.answer(ctx, c, ctx.queryParamMap(), List.of()));
            }
            config.routes.get("/api/v1/parts/{kind}/{part}", ctx -> {
                Map<String, List<String>> q = new LinkedHashMap<>(ctx.queryParamMap());
                q.put("kind", List.of(ctx.pathParam("kind")));
                q.put("part", List.of(ctx.pathParam("part")));
                s.answer(ctx, "show", q, List.of());
            });
            config.routes.post("/api/v1/check", ctx -> s.answer(ctx, "check", s.formParams(ctx), uploads(ctx)));
            // replace with the stages that use the part re-checked: multipart fields stages and bom
            config.routes.post("/api/v1/replace", ctx -> s.answer(ctx, "replace", s.formParams(ctx), uploads(ctx)));
            config.routes.post("/api/v1/import", s::importFiles);
            config.routes.exception(Exception.class, (e, ctx) -> s.internal(ctx, e));
            config.routes.error(404, ctx -> {
                if (ctx.result() == null || ctx.result().isEmpty()) {
                    error(ctx, 404, "not found", "no page or API at " + ctx.path() + " (the API is under /api/v1;"
                            + " its description is /api/v1/openapi.json)", List.of());
                }
            });
            config.routes.error(413, s::tooLarge);
        }).start();
        return s;
    }

    /** The port listened on (the one chosen when 0 was asked). */
    public int port() {
        return app.port();
    }

    /** Where to open the pages. */
    public String url() {
        String h = settings.host().contains(":") ? "[" + settings.host() + "]" : settings.host();
        return "http://" + h + ":" + port() + "/";
    }

    /** Whether it listens on a loopback address only. */
    public boolean loopback() {
        return loopback;
    }

    /** Waits until the server is stopped. */
    public void join() throws InterruptedException {
        stopped.await();
    }

    @Override
    public void close() throws IOException {
        app.stop();
        pool.shutdownNow();
        views.close();
        stopped.countDown();
    }

    /**
     * Before every request: the headers that keep pages to this origin, a Host check against DNS
     * rebinding when bound to loopback, and for every POST a same-origin check (cross-site requests
     * are refused).
     */
    private void guard(Context ctx) {
        ctx.header("Content-Security-Policy", CSP);
        ctx.header("X-Content-Type-Options", "nosniff");
        ctx.header("Referrer-Policy", "no-referrer");
        ctx.header("Cross-Origin-Resource-Policy", "same-origin");
        ctx.header("Cache-Control", "no-store");
        String host = ctx.header("Host");
        if (loopback && (host == null || !loopbackName(host))) {
            error(ctx, 403, "forbidden", "this server listens on loopback and answers only requests addressed to"
                    + " localhost or 127.0.0.1 (got Host " + host + ")", List.of());
            ctx.skipRemainingHandlers();
            return;
        }
        if (ctx.req().getContentLengthLong() > settings.maxRequestBytes()) {
            tooLarge(ctx);
            ctx.skipRemainingHandlers();
            return;
        }
        if (!ctx.method().toString().equals("GET") && !ctx.method().toString().equals("HEAD")) {
            String origin = ctx.header("Origin");
            String site = ctx.header("Sec-Fetch-Site");
            boolean sameOrigin = origin == null || origin.equals("null") ? site == null || site.equals("same-origin")
                    || site.equals("none") : sameOrigin(origin, host);
            if (!sameOrigin || site != null && site.equals("cross-site")) {
                error(ctx, 403, "forbidden", "cross-site request refused: a POST must come from this server's own"
                        + " pages (Origin " + origin + ", Host " + host + ")", List.of());
                ctx.skipRemainingHandlers();
            }
        }
    }

    private static boolean sameOrigin(String origin, String host) {
        try {
            URI u = URI.create(origin);
            String o = u.getHost() == null ? "" : u.getHost() + (u.getPort() < 0 ? "" : ":" + u.getPort());
            return "http".equals(u.getScheme()) && host != null && o.equalsIgnoreCase(host);
        } catch (IllegalArgumentException e) {
            return false;
        }
    }

    private static boolean loopbackName(String host) {
        String h = host.toLowerCase(Locale.ROOT);
        h = h.startsWith("[") ? h.substring(0, h.indexOf(']') + 1) : h.replaceFirst(":\\d+$", "");
        return h.equals("localhost") || h.equals("[::1]") || h.matches("127\\.\\d{1,3}\\.\\d{1,3}\\.\\d{1,3}");
    }

    private void page(Context ctx, String name) {
        String html = new String(resource("web/" + name + ".html"), StandardCharsets.UTF_8)
                .replace("@CAUTION@", escape(Caution.TEXT));
        ctx.contentType("text/html; charset=utf-8").result(html);
    }

    private static final Set<String> STATIC = Set.of("gatefit.js", "gatefit.css", "catalog.js", "part.js",
            "switch.js", "pair.js", "design.js", "replace.js");

    private void staticFile(Context ctx) {
        String f = ctx.pathParam("file");
        if (!STATIC.contains(f)) {
            error(ctx, 404, "not found", "no file /static/" + f, List.of());
            return;
        }
        ctx.contentType(f.endsWith(".css") ? "text/css; charset=utf-8" : "text/javascript; charset=utf-8")
                .result(resource("web/" + f));
    }

    /** What the pages need to know: the caution, whether imports are open, the version. */
    private void about(Context ctx) throws IOException {
        StringWriter w = new StringWriter();
        try (JsonGenerator g = JSON.createGenerator(w)) {
            g.writeStartObject();
            g.writeStringField("caution", Caution.TEXT);
            g.writeBooleanField("read_only", settings.importToken() == null);
            String v = Server.class.getPackage().getImplementationVersion();
            g.writeStringField("version", v == null ? "development build" : v);
            g.writeEndObject();
        }
        ctx.contentType("application/json; charset=utf-8").result(w.toString());
    }

    private void importFiles(Context ctx) {
        if (settings.importToken() == null) {
            error(ctx, 403, "read-only", "this server is read-only: start it with --allow-import to take imports"
                    + " through the web, or import with 'gatefit import' on the server's machine", List.of());
            return;
        }
        String auth = ctx.header("Authorization");
        if (auth == null || !java.security.MessageDigest.isEqual(auth.getBytes(StandardCharsets.UTF_8),
                ("Bearer " + settings.importToken()).getBytes(StandardCharsets.UTF_8))) {
            error(ctx, 401, "token", "an import needs the token printed when the server started, as the header"
                    + " 'Authorization: Bearer TOKEN'", List.of());
            return;
        }
        answer(ctx, "import", formParams(ctx), uploads(ctx));
    }

    private Map<String, List<String>> formParams(Context ctx) {
        Map<String, List<String>> p = new LinkedHashMap<>(ctx.queryParamMap());
        Set<String> files = ctx.isMultipartFormData() ? ctx.uploadedFileMap().keySet() : Set.of();
        ctx.formParamMap().forEach((k, v) -> {
            if (!files.contains(k)) {
                p.put(k, v);
            }
        });
        return p;
    }

    private static List<Questions.Upload> uploads(Context ctx) {
        List<Questions.Upload> out = new ArrayList<>();
        for (Map.Entry<String, List<UploadedFile>> e : ctx.uploadedFileMap().entrySet()) {
            for (UploadedFile f : e.getValue()) {
                try (InputStream in = f.content()) {
                    out.add(new Questions.Upload(e.getKey(), f.filename(), in.readAllBytes()));
                } catch (IOException ex) {
                    throw new UncheckedIOException(ex);
                }
            }
        }
        return out;
    }

    /** Asks a question on a worker, within the time limit, and writes the answer or the error. */
    private void answer(Context ctx, String command, Map<String, List<String>> params, List<Questions.Upload> uploads) {
        Future<Questions.Answer> f;
        try {
            f = pool.submit(() -> {
                try (Catalog view = "import".equals(command) ? null : views.acquire()) {
                    return questions.ask(view, command, params, uploads);
                }
            });
        } catch (RejectedExecutionException e) {
            error(ctx, 503, "busy", "the server is answering as many questions as it takes at once; try again",
                    List.of());
            return;
        }
        Questions.Answer a;
        try {
            a = f.get(settings.timeout().toMillis(), TimeUnit.MILLISECONDS);
        } catch (TimeoutException e) {
            f.cancel(true);
            long ms = settings.timeout().toMillis();
            error(ctx, 503, "timeout", "the question took longer than " + (ms % 1000 == 0 ? ms / 1000 + " s" : ms
                    + " ms") + " (gatefit serve --timeout); narrow it (--top, filters) or ask again", List.of());
            return;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            error(ctx, 503, "stopping", "the server is stopping", List.of());
            return;
        } catch (ExecutionException e) {
            internal(ctx, e.getCause());
            return;
        }
        ctx.header("Gatefit-Exit-Code", Integer.toString(a.exitCode()));
        for (String w : a.warnings()) {
            ctx.res().addHeader("Gatefit-Warning", URLEncoder.encode(w, StandardCharsets.UTF_8));
        }
        int status = status(a);
        if (status != 200) {
            error(ctx, status, kind(a), a.message(), a.warnings());
            return;
        }
        if (a.mediaType().startsWith("text/html")) {
            ctx.header("Content-Security-Policy", REPORT_CSP);
        }
        if (params.containsKey("download")) {
            ctx.header("Content-Disposition", "attachment; filename=\"gatefit-" + command + extension(a.mediaType())
                    + "\"");
        }
        ctx.status(200).contentType(a.mediaType()).result(a.body());
    }

    private static String extension(String mediaType) {
        String t = mediaType.replaceFirst(";.*", "");
        return switch (t) {
            case "text/html" -> ".html";
            case "text/csv" -> ".csv";
            case "text/markdown" -> ".md";
            case "application/xml" -> ".junit.xml";
            case "application/json" -> ".json";
            default -> ".txt";
        };
    }

    /**
     * The HTTP status of an answer, from the exit code's meaning: done or a checked pair failed 200;
     * a part not in the catalog 404; a usage error or bad input 400; the catalog missing, locked,
     * damaged or another I/O problem 503; a bug 500.
     */
    static int status(Questions.Answer a) {
        if (a.notFound()) {
            return 404;
        }
        return switch (a.exitCode()) {
            case 0, 1 -> 200;
            case 2, 3 -> 400;
            case 4 -> 503;
            default -> 500;
        };
    }

    private static String kind(Questions.Answer a) {
        if (a.notFound()) {
            return "not found";
        }
        return switch (a.exitCode()) {
            case 2 -> "usage";
            case 3 -> "bad input";
            case 4 -> "catalog unavailable";
            default -> "internal";
        };
    }

    private void tooLarge(Context ctx) {
        error(ctx, 413, "too large", "the request is larger than " + settings.maxRequestBytes()
                + " bytes (gatefit serve --max-request)", List.of());
    }

    private void internal(Context ctx, Throwable e) {
        // Jetty refuses a malformed request body (a multipart form cut short, or longer than the
        // limit while it is read, as a body sent in chunks without its length is) as a bad message.
        for (Throwable c = e; c != null; c = c.getCause()) {
            // BadMessageException (deprecated in Jetty 12) is the HttpException with code 400.
            if (c instanceof HttpException bad && bad.getCode() == 400) {
                for (Throwable d = c; d != null; d = d.getCause()) {
                    if (d.getMessage() != null && d.getMessage().startsWith("max length exceeded")) {
                        tooLarge(ctx);
                        return;
                    }
                }
                error(ctx, 400, "bad request", "the request could not be read: " + bad.getReason(), List.of());
                return;
            }
        }
        error(ctx, 500, "internal", "internal error: " + e + " — a bug in gatefit: please report it with the"
                + " request", List.of());
    }

    /** An error as JSON: {@code {"status", "error", "message", "warnings"}}. */
    static void error(Context ctx, int status, String kind, String message, List<String> warnings) {
        StringWriter w = new StringWriter();
        try (JsonGenerator g = JSON.createGenerator(w)) {
            g.useDefaultPrettyPrinter();
            g.writeStartObject();
            g.writeNumberField("status", status);
            g.writeStringField("error", kind);
            g.writeStringField("message", message);
            g.writeArrayFieldStart("warnings");
            for (String s : warnings) {
                g.writeString(s);
            }
            g.writeEndArray();
            g.writeEndObject();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        ctx.status(status).contentType("application/json; charset=utf-8").result(w.toString());
    }

    static byte[] resource(String name) {
        try (InputStream in = Server.class.getResourceAsStream(name)) {
            if (in == null) {
                throw new IllegalStateException("resource missing from the jar: org/gatefit/serve/" + name);
            }
            return in.readAllBytes();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    static String escape(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;")
                .replace("'", "&#39;");
    }
}
