package org.gatefit.cli;

import java.security.SecureRandom;
import java.time.Duration;
import java.util.HexFormat;
import java.util.concurrent.Callable;
import org.gatefit.serve.Server;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

@Command(name = "serve", mixinStandardHelpOptions = true,
        header = "Serve the catalog as web pages and a JSON API (for you, or for a team).",
        description = {"Starts one process that answers find, show, shortlist, explain, check and replace over HTTP,"
            + " exactly as the command line does (the API returns the --format json output), with pages for the"
            + " catalog, a switch, a pair, a design and a replacement. It binds to loopback (this machine only)"
            + " unless --host says otherwise, and is read-only unless --allow-import. An import by another process"
            + " is picked up without a restart. Stop it with Ctrl-C."},
        footer = {"", "Examples:", "  gatefit serve                         # http://127.0.0.1:8080/, this machine only",
            "  gatefit serve --host 0.0.0.0 --port 8080   # a team server, read-only"})
final class ServeCommand extends CatalogCommand implements Callable<Integer> {
    @Option(names = "--port", paramLabel = "N", defaultValue = "8080",
            description = "Port to listen on, 0 for any free one (default: ${DEFAULT-VALUE}).")
    int port;

    @Option(names = "--host", paramLabel = "ADDRESS", defaultValue = "127.0.0.1",
            description = "Address to listen on (default: ${DEFAULT-VALUE}, this machine only; 0.0.0.0 for every"
                    + " network interface).")
    String host;

    @Option(names = "--allow-import", description = "Take imports through the web, guarded by a token printed at start.")
    boolean allowImport;

    @Option(names = "--max-request", paramLabel = "MB", defaultValue = "16",
            description = "Largest request (uploaded stage sheet, BOM or import) in megabytes (default: ${DEFAULT-VALUE}).")
    int maxRequestMb;

    @Option(names = "--timeout", paramLabel = "SECONDS", defaultValue = "60",
            description = "Longest time one question may take before it is answered 503 (default: ${DEFAULT-VALUE}).")
    int timeoutSeconds;

    ServeCommand(Context ctx) {
        super(ctx);
    }

    @Override
    public Integer call() throws Exception {
        if (port < 0 || port > 65535) {
            throw new UsageException("--port: expected 0 to 65535, got " + port);
        }
        if (maxRequestMb < 1 || maxRequestMb > 1024) {
            throw new UsageException("--max-request: expected 1 to 1024 MB, got " + maxRequestMb);
        }
        if (timeoutSeconds < 1) {
            throw new UsageException("--timeout: expected at least 1 second, got " + timeoutSeconds);
        }
        String token = null;
        if (allowImport) {
            byte[] b = new byte[24];
            new SecureRandom().nextBytes(b);
            token = HexFormat.of().formatHex(b);
        }
        int workers = Math.max(2, Runtime.getRuntime().availableProcessors() * 2);
        Server.Settings s = new Server.Settings(host, port, catalogDir(), token, maxRequestMb * 1024L * 1024L,
                Duration.ofSeconds(timeoutSeconds), workers);
        Server server;
        try {
            server = Server.start(s, new Answers(catalogDir(), ctx.clock));
        } catch (RuntimeException e) {
            throw new java.io.IOException("cannot listen on " + host + " port " + port + ": " + e.getMessage()
                    + " (another program may use the port: pick another with --port)", e);
        }
        ctx.out.println("gatefit serve: " + server.url() + " (catalog " + catalogDir() + ")");
        ctx.out.println(server.loopback()
                ? "Listening on loopback only: other machines cannot reach it (--host 0.0.0.0 opens it to the network)."
                : "Listening on " + host + ": anyone who can reach this machine on port " + server.port()
                        + " can read the catalog.");
        ctx.out.println(token == null ? "Read-only: import with 'gatefit import' (the server picks it up), or start"
                + " with --allow-import." : "Imports through the web need this token: " + token);
        ctx.out.println("Stop it with Ctrl-C.");
        ctx.out.flush();
        Runtime.getRuntime().addShutdownHook(new Thread(() -> {
            try {
                server.close();
            } catch (java.io.IOException ignored) {
                // stopping anyway
            }
        }, "gatefit-serve-stop"));
        server.join();
        return ExitCode.OK;
    }
}
