package org.gatefit.serve;

import java.util.List;
import java.util.Map;
import org.gatefit.index.Catalog;

/**
 * The port through which the server asks its questions: answered exactly as the command line
 * answers them ({@code cli} implements it by running the command in-process), so the API's JSON is
 * the CLI's JSON by construction.
 */
public interface Questions {
    /**
     * Runs {@code command} on {@code view}.
     *
     * @param view    the catalog view to answer from (a point-in-time handle the caller closes)
     * @param command a command name: {@code find}, {@code show}, {@code shortlist}, {@code explain},
     *                {@code check}, {@code replace}, {@code import}
     * @param params  query or form parameters, named as the command's long options without the dashes
     *                ({@code switch}, {@code bus}, {@code all}); {@code format} picks the output
     *                format (default json)
     * @param uploads files posted with the request, by field name ({@code stages}, {@code bom}, {@code files})
     */
    Answer ask(Catalog view, String command, Map<String, List<String>> params, List<Upload> uploads);

    /** A file posted with a request. */
    record Upload(String field, String fileName, byte[] content) {
    }

    /**
     * What the command answered.
     *
     * @param exitCode  the command's exit code (0, 1 a checked pair failed, 2, 3, 4, 70)
     * @param notFound  whether the failure was a part number not in the catalog
     * @param body      what the command wrote (standard output, or the JUnit XML when asked for)
     * @param mediaType the body's media type
     * @param warnings  the command's warnings (standard error lines starting {@code warning:}), without the prefix
     * @param message   the failure's message when the exit code is 2 or more, else empty
     */
    record Answer(int exitCode, boolean notFound, String body, String mediaType, List<String> warnings,
                  String message) {
        public Answer {
            warnings = List.copyOf(warnings);
        }
    }
}
