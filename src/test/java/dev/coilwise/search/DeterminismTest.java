package dev.coilwise.search;

import static org.assertj.core.api.Assertions.assertThat;

import dev.coilwise.catalog.CatalogReader;
import dev.coilwise.catalog.StockPart;
import dev.coilwise.materials.MaterialTable;
import dev.coilwise.model.Requirement;
import dev.coilwise.report.ShortlistCsv;
import dev.coilwise.report.ShortlistJson;
import dev.coilwise.requirement.RequirementReader;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ForkJoinPool;
import org.junit.jupiter.api.Test;

/**
 * The same input gives byte-identical JSON and CSV on every run and on any number of threads: the search and the
 * simulations run on parallel streams, which use the pool of the thread that starts them, so sizing inside a pool of
 * one thread and inside a pool of four compares sequential with parallel execution. Full sizing: search, stock,
 * Monte Carlo and simulation, as {@code coilwise size} runs it (on a shortlist of four).
 */
class DeterminismTest {
    private static final MaterialTable TABLE = MaterialTable.loadDefault();

    private record Output(String json, String csv) {
    }

    private static Output size(Path file, int threads) throws Exception {
        // A shortlist of 4 instead of the file's 10 keeps the test short; every step still runs.
        String text = java.nio.file.Files.readString(file).replace("shortlist: 10", "shortlist: 4");
        Requirement req = new RequirementReader(TABLE).parse(text, file.toString(), file.getParent());
        List<StockPart> stock = new ArrayList<>();
        for (Path p : req.stock()) {
            stock.addAll(new CatalogReader(TABLE).read(p).parts());
        }
        ForkJoinPool pool = new ForkJoinPool(threads);
        try {
            SizingResult r = pool.submit(() -> new Sizer(TABLE, new PrunedSearch(), SizingOptions.defaults()).size(req, stock))
                    .get();
            return new Output(ShortlistJson.write(r), ShortlistCsv.write(r));
        } finally {
            pool.shutdown();
        }
    }

    @Test
    void oneThreadAndFourThreadsAndASecondRunGiveTheSameBytes() throws Exception {
        for (String example : List.of("requirements/arrest-tool-carrier-drop.yaml", "requirements/launch-vertical-ball.yaml")) {
            Path file = Path.of(example);
            Output sequential = size(file, 1);
            Output parallel = size(file, 4);
            Output again = size(file, 4);
            assertThat(parallel.json()).as(example).isEqualTo(sequential.json());
            assertThat(parallel.csv()).as(example).isEqualTo(sequential.csv());
            assertThat(again).as(example).isEqualTo(parallel);
            assertThat(sequential.json()).contains("\"designs\" : [ {");
        }
    }
}
