package org.gatefit.cli;

import java.io.IOException;
import java.nio.file.FileSystemException;

/**
 * A result could not be written (disk full, closed pipe, no permission): says which file, or
 * standard output, as the user named it, and why. Exit 4 like every I/O failure.
 */
final class WriteFailedException extends org.gatefit.failure.EnvironmentProblem {
    private static final long serialVersionUID = 1L;

    /** @param target the file as typed, or "standard output" */
    WriteFailedException(String target, IOException cause) {
        super("cannot write " + target + ": " + reason(cause), cause);
    }

    /** @param target the file as typed; @param reason why it cannot be written */
    WriteFailedException(String target, String reason) {
        super("cannot write " + target + ": " + reason);
    }

    /** Why an I/O operation failed, without the temporary paths and class names a library puts around it. */
    static String reason(IOException e) {
        if (e instanceof java.nio.file.AccessDeniedException) {
            return "permission denied";
        }
        if (e instanceof java.nio.file.NoSuchFileException) {
            return "no such file or folder";
        }
        if (e instanceof FileSystemException f) { // its message would name the file, maybe a temporary one
            return f.getReason() != null ? f.getReason() : f.getClass().getSimpleName();
        }
        if (e.getMessage() != null && !e.getMessage().isBlank()) {
            return e.getMessage();
        }
        return e.getClass().getSimpleName();
    }

    /** The message alone: the exit-4 handler prints the exception, and this is all it needs to say. */
    @Override
    public String toString() {
        return getMessage();
    }
}
