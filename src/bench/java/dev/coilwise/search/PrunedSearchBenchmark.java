package dev.coilwise.search;

import dev.coilwise.materials.MaterialTable;
import dev.coilwise.requirement.RequirementReader;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * JMH timing of one pruned search on the full grid, each invocation on the next requirement of a set (round robin),
 * sampled so that the percentiles JMH prints (p0.50, p0.90, ...) are per-requirement search times after warm-up.
 * Sets: {@code files}, every file of {@code requirements/} (or the folder in system property
 * {@code coilwise.requirements}); {@code generated}, the report's {@value SearchBenchmarkReport#GENERATED}
 * generated requirements.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SampleTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 5)
@Measurement(iterations = 5, time = 5)
@Fork(1)
public class PrunedSearchBenchmark {
    @Param({"files", "generated"})
    public String set;

    private List<DesignSpace> spaces;
    private int next;

    @Setup(Level.Trial)
    public void load() throws IOException {
        MaterialTable table = MaterialTable.loadDefault();
        spaces = new ArrayList<>();
        if (set.equals("files")) {
            Path dir = Path.of(System.getProperty("coilwise.requirements", "requirements"));
            if (Files.isDirectory(dir)) {
                try (Stream<Path> files = Files.list(dir)) {
                    for (Path p : files.filter(f -> f.toString().endsWith(".yaml")).sorted().toList()) {
                        spaces.add(DesignSpace.of(new RequirementReader(table).read(p), table));
                    }
                }
            }
        } else {
            RequirementGenerator.generate(SearchBenchmarkReport.SEED, SearchBenchmarkReport.GENERATED)
                    .forEach(r -> spaces.add(DesignSpace.of(r, table)));
        }
        if (spaces.isEmpty()) {
            throw new IllegalStateException("no requirements in set " + set);
        }
    }

    @Benchmark
    public SearchResult prunedSearch() {
        DesignSpace s = spaces.get(next);
        next = (next + 1) % spaces.size();
        return new PrunedSearch().run(s);
    }
}
