package dev.coilwise.catalog;

import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;

import dev.coilwise.error.BadInputException;
import dev.coilwise.materials.MaterialTable;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Catalogue files that need more than a file in the corpus: made at test time, devices, missing files. */
class CatalogSafetyTest {
    private static final CatalogReader READER = new CatalogReader(MaterialTable.loadDefault());

    @Test
    void aFileOverTheSizeLimitIsRefusedBeforeItIsParsed(@TempDir Path dir) throws IOException {
        Path big = dir.resolve("big.csv");
        byte[] row = "X-1,S,music-wire,closed,1,10,20,5,7,,,,,1,EUR,1\n".getBytes(StandardCharsets.UTF_8);
        try (OutputStream out = Files.newOutputStream(big)) {
            for (long written = 0; written <= CatalogReader.MAX_BYTES; written += row.length) {
                out.write(row);
            }
        }
        long size = Files.size(big);
        assertThatThrownBy(() -> READER.read(big)).isInstanceOf(BadInputException.class)
                .hasMessage("big.csv: the file has " + size + " bytes; coilwise reads files of at most 33554432 bytes (32 MiB)");
    }

    // A device that never ends: reading stops at the size limit. The timeout only guards against a hang.
    @Test
    void anEndlessStreamIsRefusedAtTheSizeLimit() {
        Path zero = Path.of("/dev/zero");
        Assumptions.assumeTrue(Files.isReadable(zero), "no /dev/zero on this system");
        assertTimeoutPreemptively(Duration.ofSeconds(30), () -> assertThatThrownBy(() -> READER.read(zero))
                .isInstanceOf(BadInputException.class).hasMessageContaining("more than 33554432 bytes"));
    }

    @Test
    void aMissingCatalogueIsBadInputNamingIt(@TempDir Path dir) {
        assertThatThrownBy(() -> READER.read(dir.resolve("gone.csv"))).isInstanceOf(BadInputException.class)
                .hasMessage("gone.csv: cannot read the file: no such file");
    }
}
