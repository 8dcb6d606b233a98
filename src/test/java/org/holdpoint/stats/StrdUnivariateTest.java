package org.holdpoint.stats;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Locale;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Descriptives against the NIST Statistical Reference Datasets, univariate summary statistics
 * (https://www.itl.nist.gov/div898/strd/univ/, public domain). The nine .dat files are verbatim
 * copies (see /strd/); the certified mean and sd are read from each file's own header, the data
 * from lines 61 onwards as decimal text. Accuracy measure: LRE (McCullough 1998, Am. Statist.
 * 52:358–366), capped at the 15 certified digits.
 */
class StrdUnivariateTest {

    /** One StRD file: certified values and the data as decimal text. */
    record Strd(String name, double mean, double sd, int n, List<String> data) {
        static Strd load(String name) {
            List<String> lines = Accuracy.resourceLines("strd/" + name + ".dat");
            double mean = Double.NaN;
            double sd = Double.NaN;
            int n = -1;
            for (String line : lines.subList(0, 60)) {
                if (line.contains("ybar:")) {
                    mean = Double.parseDouble(firstToken(line.substring(line.indexOf("ybar:") + 5)));
                } else if (line.contains(" s:")) {
                    sd = Double.parseDouble(firstToken(line.substring(line.indexOf(" s:") + 3)));
                } else if (line.startsWith("Number of Observations:")) {
                    n = Integer.parseInt(firstToken(line.substring(line.indexOf(':') + 1)));
                }
            }
            List<String> data = lines.subList(60, lines.size()).stream().map(String::trim).filter(s -> !s.isEmpty())
                    .toList();
            return new Strd(name, mean, sd, n, data);
        }

        private static String firstToken(String s) {
            return s.trim().split("\\s+")[0];
        }
    }

    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {"PiDigits", "Lottery", "Lew", "Mavro", "Michelso", "NumAcc1", "NumAcc2", "NumAcc3",
        "NumAcc4"})
    void headerAndDataAgree(String name) {
        Strd s = Strd.load(name);
        // the header's "Number of Observations" must match the data lines found (guards the parser)
        assertThat(s.data()).hasSize(s.n());
        assertThat(s.mean()).isFinite();
        assertThat(s.sd()).isPositive();
    }

    /** Decimal door: exact decimal residuals, the accuracy the foundation issue asks for (LRE ≥ 13). */
    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {"PiDigits", "Lottery", "Lew", "Mavro", "Michelso", "NumAcc1", "NumAcc2", "NumAcc3",
        "NumAcc4"})
    void decimalSampleReachesThirteenDigits(String name) {
        Strd s = Strd.load(name);
        Descriptives d = Descriptives.of(Sample.ofDecimals(s.data().toArray(String[]::new)));
        double lreMean = Accuracy.lre(d.mean(), s.mean(), 15);
        double lreSd = Accuracy.lre(d.sd(), s.sd(), 15);
        assertThat(d.n()).isEqualTo(s.n());
        assertThat(lreMean).as("%s mean %s vs certified %s, LRE %.1f", name, d.mean(), s.mean(), lreMean)
                .isGreaterThanOrEqualTo(13);
        assertThat(lreSd).as("%s sd %s vs certified %s, LRE %.1f", name, d.sd(), s.sd(), lreSd)
                .isGreaterThanOrEqualTo(13);
    }

    /**
     * Doubles-only door ({@link Sample#of}): the decimals are rounded to binary64 before any
     * arithmetic, so on NumAcc3/4 (10⁶ and 10⁷ plus one decimal) the input itself limits the sd to
     * LRE ≈ 9.5 and 8.3 (docs/methods.md §1, table "two-pass on doubles", rounded there). Exact
     * rational arithmetic on the same binary64 inputs (Python 3.11 {@code fractions.Fraction}, run
     * once here, not by the suite) gives sd LRE 9.4569 (NumAcc3), 8.2527 (NumAcc4), 13.12 (Mavro),
     * 13.84 (Michelso): that is the ceiling, and the floors below sit 0.01 under it. Elsewhere the
     * doubles must still give 13 digits.
     */
    @ParameterizedTest(name = "{0}")
    @CsvSource({
        "PiDigits, 13, 13", "Lottery, 13, 13", "Lew, 13, 13", "Mavro, 13, 13", "Michelso, 13, 13",
        "NumAcc1, 13, 13", "NumAcc2, 13, 13", "NumAcc3, 13, 9.44", "NumAcc4, 13, 8.24"})
    void doubleSampleReachesWhatTheInputAllows(String name, double meanFloor, double sdFloor) {
        Strd s = Strd.load(name);
        double[] x = s.data().stream().mapToDouble(Double::parseDouble).toArray();
        Descriptives d = Descriptives.of(Sample.of(x));
        double lreMean = Accuracy.lre(d.mean(), s.mean(), 15);
        double lreSd = Accuracy.lre(d.sd(), s.sd(), 15);
        assertThat(lreMean).as("%s mean LRE", name).isGreaterThanOrEqualTo(meanFloor);
        assertThat(lreSd).as("%s sd LRE", name).isGreaterThanOrEqualTo(sdFloor);
    }
}
