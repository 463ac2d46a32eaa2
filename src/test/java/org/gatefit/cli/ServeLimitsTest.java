package org.gatefit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.net.Socket;
import java.net.SocketTimeoutException;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.concurrent.CountDownLatch;
import org.gatefit.serve.Server;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code gatefit serve}'s protections, each against a request that needs it: a body over the size
 * limit (413), a question over the time limit (503), a request addressed to a foreign host name on
 * a loopback server (403, against DNS rebinding), and a client that opens a connection and stalls
 * (closed after the idle timeout). The limits are set small here through {@link Server.Settings}; each
 * test was seen to fail with its protection taken out of {@code Server}.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class ServeLimitsTest {
    static final ObjectMapper JSON = new ObjectMapper();
    static final int MAX_BYTES = 64 * 1024;

    Path cat;
    Server server;
    HttpClient http = HttpClient.newBuilder().connectTimeout(Duration.ofSeconds(10)).build();

    @BeforeAll
    void start(@TempDir Path tmp) throws Exception {
        cat = CliRun.examples(tmp.resolve("cat"));
        server = Server.start(new Server.Settings("127.0.0.1", 0, cat, null, MAX_BYTES, Duration.ofSeconds(60), 2,
                Duration.ofMillis(500)), new Answers(cat, CliRun.CLOCK));
    }

    @AfterAll
    void stop() throws Exception {
        server.close();
    }

    HttpResponse<String> send(HttpRequest.Builder b) throws Exception {
        return http.send(b.timeout(Duration.ofSeconds(30)).build(), HttpResponse.BodyHandlers.ofString());
    }

    URI uri(String path) {
        return URI.create(server.url() + path.substring(1));
    }

    @Test
    void aBodyOverTheLimitIs413AndOneWithinItIsAnswered() throws Exception {
        byte[] big = new byte[MAX_BYTES + 1024];
        java.util.Arrays.fill(big, (byte) 'a');
        for (String type : new String[] {"multipart/form-data; boundary=b0", "text/csv"}) {
            ByteArrayOutputStream body = new ByteArrayOutputStream();
            if (type.startsWith("multipart")) {
                body.writeBytes("--b0\r\nContent-Disposition: form-data; name=\"stages\"; filename=\"s.csv\"\r\n\r\n"
                        .getBytes(StandardCharsets.UTF_8));
            }
            body.writeBytes(big);
            if (type.startsWith("multipart")) {
                body.writeBytes("\r\n--b0--\r\n".getBytes(StandardCharsets.UTF_8));
            }
            byte[] b = body.toByteArray();
            // With its length given (refused from the headers: "Expect: 100-continue", as large uploads
            // send it, so the body is never sent), and in chunks without it (refused while reading).
            String head = "POST /api/v1/check HTTP/1.1\r\nHost: 127.0.0.1\r\nContent-Type: " + type
                    + "\r\nConnection: close\r\n";
            String byLength = raw(head + "Content-Length: " + b.length + "\r\nExpect: 100-continue\r\n\r\n", new byte[0]);
            ByteArrayOutputStream chunked = new ByteArrayOutputStream();
            chunked.writeBytes((Integer.toHexString(b.length) + "\r\n").getBytes(StandardCharsets.US_ASCII));
            chunked.writeBytes(b);
            chunked.writeBytes("\r\n0\r\n\r\n".getBytes(StandardCharsets.US_ASCII));
            String inChunks = raw(head + "Transfer-Encoding: chunked\r\n\r\n", chunked.toByteArray());
            for (String r : List.of(byLength, inChunks)) {
                String what = type + (r == inChunks ? ", chunked" : "");
                assertTrue(r.startsWith("HTTP/1.1 413"), what + ": " + r);
                JsonNode e = JSON.readTree(r.substring(r.indexOf("\r\n\r\n") + 4));
                assertEquals("too large", e.get("error").asText(), what + ": " + r);
                assertTrue(e.get("message").asText().contains(MAX_BYTES + " bytes"), r);
            }
        }
        // The same sheet within the limit is read (and found wrong: a column of a's is no stage sheet).
        HttpResponse<String> small = send(HttpRequest.newBuilder(uri("/api/v1/check"))
                .header("Content-Type", "multipart/form-data; boundary=b0")
                .POST(HttpRequest.BodyPublishers.ofString("--b0\r\nContent-Disposition: form-data; name=\"stages\";"
                        + " filename=\"s.csv\"\r\n\r\naaaa\r\n--b0--\r\n")));
        assertEquals(400, small.statusCode(), small.body());
    }

    @Test
    void aQuestionOverTheTimeLimitIs503() throws Exception {
        // A server whose questions wait until released, with a limit of 300 ms.
        CountDownLatch release = new CountDownLatch(1);
        Answers answers = new Answers(cat, CliRun.CLOCK);
        try (Server slow = Server.start(new Server.Settings("127.0.0.1", 0, cat, null, MAX_BYTES,
                Duration.ofMillis(300), 2), (view, command, params, uploads) -> {
                    try {
                        release.await();
                    } catch (InterruptedException e) {
                        Thread.currentThread().interrupt();
                    }
                    return answers.ask(view, command, params, uploads);
                })) {
            HttpResponse<String> r = send(HttpRequest.newBuilder(URI.create(slow.url() + "api/v1/find?words=driver")));
            assertEquals(503, r.statusCode(), r.body());
            JsonNode e = JSON.readTree(r.body());
            assertEquals("timeout", e.get("error").asText());
            assertTrue(e.get("message").asText().contains("longer than 300 ms (gatefit serve --timeout)"), r.body());
        } finally {
            release.countDown();
        }
    }

    @Test
    void onLoopbackARequestForAnotherHostNameIsRefused() throws Exception {
        String foreign = raw("GET /api/v1/find?words=driver HTTP/1.1\r\nHost: evil.example\r\nConnection: close\r\n\r\n");
        assertTrue(foreign.startsWith("HTTP/1.1 403"), foreign);
        assertTrue(foreign.contains("answers only requests addressed to localhost or 127.0.0.1"), foreign);
        String library = raw("GET /webjars/uplot/1.6.30/dist/uPlot.min.css HTTP/1.1\r\nHost: evil.example\r\n"
                + "Connection: close\r\n\r\n");
        assertTrue(library.startsWith("HTTP/1.1 403"), "static files too: " + library);
        String rebound = raw("GET / HTTP/1.1\r\nHost: evil.example:" + server.port() + "\r\nConnection: close\r\n\r\n");
        assertTrue(rebound.startsWith("HTTP/1.1 403"), rebound);
        for (String host : new String[] {"localhost:" + server.port(), "127.0.0.1:" + server.port(), "[::1]"}) {
            String own = raw("GET /api/v1/find?words=driver HTTP/1.1\r\nHost: " + host + "\r\nConnection: close\r\n\r\n");
            assertTrue(own.startsWith("HTTP/1.1 200"), host + ": " + own);
        }
    }

    @Test
    void aClientThatStallsIsDisconnected() throws Exception {
        try (Socket s = new Socket("127.0.0.1", server.port())) {
            // Half a request, then nothing: the server closes the connection after its idle timeout
            // (0.5 s here; Jetty's own default, 30 s, is longer than this read waits).
            s.getOutputStream().write("GET / HTTP/1.1\r\nHost: 127.0.0.1\r\n".getBytes(StandardCharsets.US_ASCII));
            s.getOutputStream().flush();
            s.setSoTimeout(15_000);
            InputStream in = s.getInputStream();
            try {
                byte[] buf = new byte[4096];
                int n;
                while ((n = in.read(buf)) >= 0) {
                    assertTrue(n > 0);
                    // Jetty may answer 408 before it closes; either way the connection ends.
                }
            } catch (SocketTimeoutException e) {
                throw new AssertionError("the stalled connection was still open after 15 s", e);
            } catch (IOException closed) {
                // reset by the server: closed too
            }
        }
    }

    /**
     * One request written as is on a socket (HttpClient will not send a Host header of our choosing,
     * and Java 17's waits for ever when a server answers "Expect: 100-continue" with a refusal).
     */
    String raw(String request) throws IOException {
        return raw(request, new byte[0]);
    }

    String raw(String head, byte[] body) throws IOException {
        try (Socket s = new Socket("127.0.0.1", server.port())) {
            s.setSoTimeout(30_000);
            OutputStream out = s.getOutputStream();
            out.write(head.getBytes(StandardCharsets.US_ASCII));
            out.write(body);
            out.flush();
            return new String(s.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        }
    }
}
