package org.gatefit.cli;

/** Entry point of {@code java -jar gatefit.jar}. */
public final class Main {
    private Main() {
    }

    public static void main(String[] args) {
        // HTML reports draw charts with AWT; never with a display (set before AWT could load).
        System.setProperty("java.awt.headless", "true");
        System.exit(Cli.run(args));
    }
}
