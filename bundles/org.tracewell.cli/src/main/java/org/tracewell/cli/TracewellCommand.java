package org.tracewell.cli;

import java.io.IOException;
import java.io.PrintStream;
import java.net.URISyntaxException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.CodeSource;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.jar.JarFile;
import java.util.jar.Manifest;

/** Entry point of the headless `tracewell` command: dispatches to one subcommand. */
public final class TracewellCommand {

    private record Entry(String summary, Subcommand command) {
    }

    private final Map<String, Entry> commands = new LinkedHashMap<>();

    TracewellCommand() {
        commands.put("analyze", new Entry("analyse a machine file and write the design-review report",
                AnalyzeCommand::run));
        commands.put("montecarlo", new Entry("seeded Monte-Carlo tolerance study: spreads, percentiles, yields",
                StudyCommand::montecarlo));
        commands.put("sweep", new Entry("1-D or 2-D parameter sweep of any numeric model attribute",
                StudyCommand::sweep));
        commands.put("loop", new Entry("analyse one loop given as transfer-function coefficients", LoopCommand::run));
        commands.put("validate", new Entry("check a machine or axis file against the model rules", ValidateCommand::run));
        commands.put("diff", new Entry("semantic difference of two versions of a machine file", DiffCommand::run));
        commands.put("measured", new Entry("evaluate a measurement CSV (frf, circle, positioning) against the model",
                MeasuredCommand::run));
    }

    public static void main(String[] args) {
        System.exit(new TracewellCommand().run(args, System.out, System.err));
    }

    int run(String[] args, PrintStream out, PrintStream err) {
        if (args.length == 0 || args[0].equals("--help") || args[0].equals("-h") || args[0].equals("help")) {
            printUsage(args.length == 0 ? err : out);
            return args.length == 0 ? ExitCode.BAD_INPUT : ExitCode.OK;
        }
        if (args[0].equals("--version") || args[0].equals("version")) {
            out.println("tracewell " + version());
            return ExitCode.OK;
        }
        Entry entry = commands.get(args[0]);
        if (entry == null) {
            err.println("tracewell: unknown command '" + args[0] + "'. Commands: gui, test, "
                    + String.join(", ", commands.keySet()) + ". Try 'tracewell --help'.");
            return ExitCode.BAD_INPUT;
        }
        try {
            return entry.command().run(Arrays.copyOfRange(args, 1, args.length), out, err);
        } catch (RuntimeException e) {
            err.println("tracewell " + args[0] + ": internal error: " + e);
            e.printStackTrace(err);
            return ExitCode.INTERNAL_ERROR;
        }
    }

    private void printUsage(PrintStream out) {
        out.println("Usage: tracewell COMMAND [ARGS]   (tracewell " + version() + ")");
        out.println();
        out.printf("  %-10s %s%n", "gui", "open the workbench (needs a display)");
        out.printf("  %-10s %s%n", "test", "build and run all tests");
        commands.forEach((name, entry) -> out.printf("  %-10s %s%n", name, entry.summary()));
        out.printf("  %-10s %s%n", "--version", "print the version");
        out.println();
        out.println("Exit codes: 0 ok / all requirements met, 1 a requirement violated, 2 bad input, 3 internal error.");
    }

    /** Bundle-Version of this bundle's jar, e.g. "0.1.0.202612011830"; "development" when run from classes. */
    static String version() {
        CodeSource source = TracewellCommand.class.getProtectionDomain().getCodeSource();
        if (source == null) {
            return "development";
        }
        try {
            Path location = Path.of(source.getLocation().toURI());
            if (Files.isRegularFile(location)) {
                try (JarFile jar = new JarFile(location.toFile())) {
                    return bundleVersion(jar.getManifest());
                }
            }
            Path manifest = location.resolve("../META-INF/MANIFEST.MF").normalize();
            if (!Files.isRegularFile(manifest)) {
                manifest = location.resolve("META-INF/MANIFEST.MF");
            }
            if (Files.isRegularFile(manifest)) {
                try (var in = Files.newInputStream(manifest)) {
                    return bundleVersion(new Manifest(in));
                }
            }
        } catch (IOException | URISyntaxException | IllegalArgumentException e) {
            return "development";
        }
        return "development";
    }

    private static String bundleVersion(Manifest manifest) {
        String version = manifest == null ? null : manifest.getMainAttributes().getValue("Bundle-Version");
        return version == null ? "development" : version;
    }
}
