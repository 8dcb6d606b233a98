package org.holdpoint.importer;

import static org.assertj.core.api.Assertions.assertThat;

import java.math.BigDecimal;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * The fast decimal parser against the JDK: every double must equal {@link Double#parseDouble} (which
 * is correctly rounded per its specification) and every exact result must equal {@link BigDecimal}'s
 * reading of the same text.
 */
class DecimalParserTest {

    @Test
    void randomDecimalStringsMatchTheJdk() {
        SplittableRandom rnd = new SplittableRandom(20261201L);
        DecimalParser p = new DecimalParser('.');
        int exact = 0;
        for (int k = 0; k < 200_000; k++) {
            String s = randomNumber(rnd);
            int r = p.parse(s);
            assertThat(r).as(s).isNotEqualTo(DecimalParser.NOT_A_NUMBER);
            double expected = Double.parseDouble(s);
            assertThat(p.value).as(s).isEqualTo(expected);
            if (r == DecimalParser.EXACT) {
                exact++;
                assertThat(BigDecimal.valueOf(p.unscaled, p.scale).compareTo(new BigDecimal(s))).as(s).isZero();
            }
        }
        // most generated texts have few digits and must take the exact path
        assertThat(exact).isGreaterThan(100_000);
    }

    @Test
    void randomBitPatternsRoundTripThroughTheirShortestText() {
        SplittableRandom rnd = new SplittableRandom(7L);
        DecimalParser p = new DecimalParser('.');
        for (int k = 0; k < 100_000; k++) {
            double d = Double.longBitsToDouble(rnd.nextLong());
            if (!Double.isFinite(d)) {
                continue;
            }
            String s = Double.toString(d);
            assertThat(p.parse(s)).isNotEqualTo(DecimalParser.NOT_A_NUMBER);
            assertThat(p.value).as(s).isEqualTo(Double.parseDouble(s));
        }
    }

    @Test
    void decimalCommaAndSigns() {
        DecimalParser p = new DecimalParser(',');
        assertThat(p.parse(" -12,5 ")).isEqualTo(DecimalParser.EXACT);
        assertThat(p.unscaled).isEqualTo(-125);
        assertThat(p.scale).isEqualTo(1);
        assertThat(p.parse("12.5")).isEqualTo(DecimalParser.NOT_A_NUMBER);
        assertThat(p.parse("\u22123,25")).isEqualTo(DecimalParser.EXACT);
        assertThat(p.value).isEqualTo(-3.25);
    }

    @Test
    void rejectsWhatIsNotANumber() {
        DecimalParser p = new DecimalParser('.');
        for (String s : new String[] {"", " ", ".", "-", "+", "e5", "1e", "1e+", "1.2.3", "1,5", "n/a", "NaN",
                "Infinity", "0x10", "1 2", "--1", "1e5x", "12mm"}) {
            assertThat(p.parse(s)).as(s).isEqualTo(DecimalParser.NOT_A_NUMBER);
        }
    }

    @Test
    void keepsTrailingZerosAsScale() {
        DecimalParser p = new DecimalParser('.');
        assertThat(p.parse("10.1200")).isEqualTo(DecimalParser.EXACT);
        assertThat(p.unscaled).isEqualTo(101200);
        assertThat(p.scale).isEqualTo(4);
        assertThat(p.parse("1.5E3")).isEqualTo(DecimalParser.EXACT);
        assertThat(p.unscaled).isEqualTo(1500);
        assertThat(p.scale).isZero();
        assertThat(p.parse("1.2345e-2")).isEqualTo(DecimalParser.EXACT);
        assertThat(p.unscaled).isEqualTo(12345);
        assertThat(p.scale).isEqualTo(6);
    }

    private static String randomNumber(SplittableRandom rnd) {
        StringBuilder sb = new StringBuilder();
        int sign = rnd.nextInt(4);
        if (sign == 0) {
            sb.append('-');
        } else if (sign == 1) {
            sb.append('+');
        }
        int form = rnd.nextInt(10);
        int intDigits = form == 0 ? 0 : 1 + rnd.nextInt(form < 8 ? 6 : 25);
        int fracDigits = rnd.nextInt(form < 8 ? 7 : 25);
        if (intDigits == 0 && fracDigits == 0) {
            fracDigits = 1;
        }
        for (int i = 0; i < intDigits; i++) {
            sb.append((char) ('0' + rnd.nextInt(10)));
        }
        if (fracDigits > 0 || rnd.nextBoolean()) {
            sb.append('.');
        }
        for (int i = 0; i < fracDigits; i++) {
            sb.append((char) ('0' + rnd.nextInt(10)));
        }
        if (rnd.nextInt(5) == 0) {
            sb.append(rnd.nextBoolean() ? 'e' : 'E');
            int e = rnd.nextInt(4);
            if (e == 0) {
                sb.append('-');
            } else if (e == 1) {
                sb.append('+');
            }
            sb.append(rnd.nextInt(rnd.nextInt(10) == 0 ? 330 : 25));
        }
        return sb.toString();
    }
}
