package dev.coilwise.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.Set;

/**
 * Runs a short command in a JVM set up for a short run. A {@code size} or {@code simulate} run lasts about a second,
 * and with the JVM's default settings much of that second goes to the optimising compiler (its work never pays back
 * in so short a run) and to loading and verifying classes one by one. When coilwise is started plainly, as
 * {@code java -jar coilwise.jar size ...} with no JVM options, it therefore starts the same jar once more as a child
 * process with the settings {@code bin/coilwise} uses (the quick compiler only, the serial collector, and the
 * class-data archive the build writes beside the jar when it is there and newer than the jar), passes it the standard streams and the
 * arguments unchanged, and exits with its exit code. The child never starts another.
 *
 * <p>Nothing else changes: the output is the same, byte for byte. A user who gives JVM options (or sets
 * {@code JDK_JAVA_OPTIONS} or {@code JAVA_TOOL_OPTIONS}) keeps exactly the JVM asked for; setting the environment
 * variable {@code COILWISE_SAME_JVM} to any value also keeps the run in the first JVM. When the child cannot be
 * started, the run goes on in the first JVM. See docs/performance.md.
 */
final class Relaunch {
    /** System property that marks the child, so that it never starts another. */
    static final String CHILD = "coilwise.child";
    /** Environment variable that keeps every run in the JVM it was started in. */
    static final String SAME_JVM = "COILWISE_SAME_JVM";
    /** Commands whose runs are short but heavy enough for the second start to pay. */
    static final Set<String> SHORT_HEAVY = Set.of("size", "simulate");
    /** Name of the class-data archive the build writes beside the jar. */
    static final String ARCHIVE = "coilwise.jsa";

    private Relaunch() {
    }

    /**
     * The child's command line, or empty when the run should go on in this JVM. Pure.
     *
     * @param java          the java executable of this JVM, if known
     * @param jvmArguments  the arguments this JVM was started with (those after the executable), if known
     * @param classPath     this JVM's class path
     * @param child         whether this JVM is already a child
     * @param keep          whether the user asked to keep the run in this JVM (environment)
     * @param archive       the class-data archive beside the jar, if it exists
     * @param args          coilwise's own arguments
     */
    static Optional<List<String>> plan(Optional<String> java, Optional<List<String>> jvmArguments, String classPath,
                                       boolean child, boolean keep, Optional<Path> archive, List<String> args) {
        if (child || keep || java.isEmpty() || jvmArguments.isEmpty() || args.isEmpty()
                || !SHORT_HEAVY.contains(args.get(0)) || args.contains("--help") || args.contains("-h")) {
            return Optional.empty();
        }
        List<String> given = jvmArguments.get();
        // Only the plain form "java -jar JAR args...": any JVM option before -jar is the user's choice of JVM.
        if (given.size() < 2 + args.size() || !given.get(0).equals("-jar") || !given.get(1).equals(classPath)
                || !classPath.endsWith(".jar") || !given.subList(2, given.size()).equals(args)) {
            return Optional.empty();
        }
        List<String> cmd = new ArrayList<>(List.of(java.get(), "-XX:TieredStopAtLevel=1", "-XX:+UseSerialGC"));
        archive.ifPresent(a -> cmd.addAll(List.of("-XX:SharedArchiveFile=" + a, "-Xlog:disable",
                "-Xlog:all=warning:stderr")));
        cmd.add("-D" + CHILD + "=true");
        cmd.add("-jar");
        cmd.add(classPath);
        cmd.addAll(args);
        return Optional.of(cmd);
    }

    /**
     * The archive when it was written after the jar: one left from an earlier build (the jar rebuilt with
     * {@code -Dcds.skip=true}) would only make the JVM print a warning and start without it.
     */
    private static Optional<Path> current(Path archive, Path jar) {
        try {
            return Files.isRegularFile(archive)
                    && Files.getLastModifiedTime(archive).compareTo(Files.getLastModifiedTime(jar)) >= 0
                    ? Optional.of(archive) : Optional.empty();
        } catch (IOException | SecurityException e) {
            return Optional.empty();
        }
    }

    /**
     * Runs the command in a child JVM when {@link #plan} says so.
     *
     * @return the child's exit code, or empty when the run should go on in this JVM
     */
    static OptionalInt attempt(String... args) {
        ProcessHandle.Info info = ProcessHandle.current().info();
        String classPath = System.getProperty("java.class.path", "");
        Path jar = Path.of(classPath).toAbsolutePath();
        Path archive = jar.resolveSibling(ARCHIVE);
        boolean keep = System.getenv(SAME_JVM) != null || System.getenv("JDK_JAVA_OPTIONS") != null
                || System.getenv("JAVA_TOOL_OPTIONS") != null;
        Optional<List<String>> cmd = plan(info.command(), info.arguments().map(List::of), classPath,
                Boolean.getBoolean(CHILD), keep, current(archive, jar), List.of(args));
        if (cmd.isEmpty()) {
            return OptionalInt.empty();
        }
        Process p;
        try {
            p = new ProcessBuilder(cmd.get()).inheritIO().start();
        } catch (IOException | SecurityException | UnsupportedOperationException e) {
            return OptionalInt.empty(); // no child process here: the run goes on in this JVM, only slower to start
        }
        Thread stop = new Thread(p::destroy, "coilwise-child-stop");
        Runtime.getRuntime().addShutdownHook(stop);
        try {
            int code = p.waitFor();
            Runtime.getRuntime().removeShutdownHook(stop);
            return OptionalInt.of(code);
        } catch (InterruptedException e) {
            p.destroy();
            Thread.currentThread().interrupt();
            return OptionalInt.of(ExitCode.INTERNAL);
        }
    }
}
