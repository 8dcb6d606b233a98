package org.holdpoint.workflow;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.holdpoint.importer.DataImporter;
import org.holdpoint.importer.ImportRequest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The analysis warm-up analyses its invented characteristic without a problem, and the importer tells its caller how
 * many cells a file held once they are read (where the warm-up is started for large files).
 */
class AnalysisWarmUpTest {
    @Test
    void theInventedCharacteristicIsAnalysed() {
        assertThat(AnalysisWarmUp.run()).isEqualTo(1);
    }

    @Test
    void theImporterTellsTheCellsReadBeforeTheLayout(@TempDir Path dir) throws Exception {
        StringBuilder csv = new StringBuilder("phase,Bore (mm)\n");
        for (int i = 0; i < 20; i++) {
            csv.append(i < 10 ? "before" : "after").append(',').append(12 + i % 3 * 0.001).append('\n');
        }
        Path f = Files.writeString(dir.resolve("bore.csv"), csv, StandardCharsets.UTF_8);
        List<Long> told = new ArrayList<>();
        new DataImporter(told::add).read(ImportRequest.of(f));
        // the header's 2 cells and 20 rows of 2
        assertThat(told).containsExactly(42L);
        assertThat(AnalysisWarmUp.FROM_CELLS).isGreaterThan(42L);
    }
}
