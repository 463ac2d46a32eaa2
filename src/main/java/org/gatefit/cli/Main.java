package org.gatefit.cli;

/** Entry point of {@code java -jar gatefit.jar}. */
public final class Main {
    private Main() {
    }

    public static void main(String[] args) {
        System.exit(Cli.run(args));
    }
}
