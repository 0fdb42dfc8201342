package dev.coilwise.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;

/** When a short run moves to a child JVM set up for short runs, and with what command line. */
class RelaunchTest {
    private static final Optional<String> JAVA = Optional.of("/usr/lib/jvm/bin/java");
    private static final String JAR = "target/coilwise.jar";
    private static final List<String> ARGS = List.of("size", "requirements/a.yaml", "--top", "3");
    private static final Optional<Path> ARCHIVE = Optional.of(Path.of("/work/target/coilwise.jsa"));

    private static Optional<List<String>> plan(List<String> jvmArgs, boolean child, boolean keep, List<String> args) {
        return Relaunch.plan(JAVA, Optional.of(jvmArgs), JAR, child, keep, ARCHIVE, args);
    }

    private static List<String> plain(List<String> args) {
        return concat(List.of("-jar", JAR), args);
    }

    private static List<String> concat(List<String> a, List<String> b) {
        return java.util.stream.Stream.concat(a.stream(), b.stream()).toList();
    }

    @Test
    void aPlainJavaDashJarSizeRunMovesToAChildWithTheShortRunSettingsAndTheSameArguments() {
        assertThat(plan(plain(ARGS), false, false, ARGS)).contains(concat(List.of("/usr/lib/jvm/bin/java",
                "-XX:TieredStopAtLevel=1", "-XX:+UseSerialGC", "-XX:SharedArchiveFile=/work/target/coilwise.jsa",
                "-Xlog:disable", "-Xlog:all=warning:stderr", "-Dcoilwise.child=true", "-jar", JAR), ARGS));
    }

    @Test
    void withoutAnArchiveTheChildRunsWithoutOne() {
        List<String> sim = List.of("simulate", "r.yaml", "--spring", "s.yaml");
        assertThat(Relaunch.plan(JAVA, Optional.of(plain(sim)), JAR, false, false, Optional.empty(), sim))
                .contains(concat(List.of("/usr/lib/jvm/bin/java", "-XX:TieredStopAtLevel=1", "-XX:+UseSerialGC",
                        "-Dcoilwise.child=true", "-jar", JAR), sim));
    }

    @Test
    void jvmOptionsGivenByTheUserKeepTheRunInTheirJvm() {
        assertThat(plan(concat(List.of("-Xmx2g"), plain(ARGS)), false, false, ARGS)).isEmpty();
        assertThat(plan(concat(List.of("-XX:TieredStopAtLevel=1"), plain(ARGS)), false, false, ARGS)).isEmpty();
    }

    @Test
    void theChildNeverStartsAnotherAndTheEnvironmentCanKeepTheRunInPlace() {
        assertThat(plan(plain(ARGS), true, false, ARGS)).isEmpty();
        assertThat(plan(plain(ARGS), false, true, ARGS)).isEmpty();
    }

    @Test
    void quickCommandsHelpAndUnknownLaunchesStayInTheFirstJvm() {
        for (List<String> args : List.of(List.of("materials"), List.of("check", "r.yaml", "--spring", "s.yaml"),
                List.of("size", "--help"), List.of("size", "-h"), List.<String>of())) {
            assertThat(plan(plain(args), false, false, args)).as(args.toString()).isEmpty();
        }
        assertThat(Relaunch.plan(Optional.empty(), Optional.of(plain(ARGS)), JAR, false, false, ARCHIVE, ARGS))
                .as("java executable unknown").isEmpty();
        assertThat(Relaunch.plan(JAVA, Optional.empty(), JAR, false, false, ARCHIVE, ARGS))
                .as("JVM arguments unknown").isEmpty();
    }

    @Test
    void aClassPathRunOrArgumentsThatDoNotMatchStayInTheFirstJvm() {
        List<String> cp = concat(List.of("-cp", "target/classes", "dev.coilwise.cli.Main"), ARGS);
        assertThat(Relaunch.plan(JAVA, Optional.of(cp), "target/classes", false, false, ARCHIVE, ARGS)).isEmpty();
        assertThat(plan(plain(List.of("size", "other.yaml")), false, false, ARGS)).as("arguments differ").isEmpty();
        assertThat(Relaunch.plan(JAVA, Optional.of(List.of("-jar", "x.jar", "size", "a.yaml")), "x.zip", false, false,
                ARCHIVE, List.of("size", "a.yaml"))).as("class path is no jar").isEmpty();
    }
}
