package org.holdpoint.result;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.holdpoint.stats.Conclusion;
import org.holdpoint.stats.EquivalenceResult;
import org.holdpoint.result.Verdict.Status;

/**
 * The verdict rules: a characteristic passes when its equivalence (or one-sided margin) claim holds
 * and every limit that was set is met; the change is verified only when every characteristic passes
 * (intersection–union, Berger 1982), so that claim needs no multiplicity adjustment.
 */
public final class Verdicts {
    private Verdicts() {
    }

    /**
     * @param r        the result without its verdict
     * @param decimals decimals for values in the characteristic's unit (its resolution plus two)
     * @return the result with its verdict and the reasons in words
     */
    public static CharacteristicResult judge(CharacteristicResult r, int decimals) {
        if (r.verdict().status() == Status.NOT_ASSESSABLE) {
            return r;
        }
        List<String> reasons = new ArrayList<>();
        Status status;
        EquivalenceResult eq = r.decidingTost();
        if (eq == null) {
            status = Status.NOT_ASSESSED;
            reasons.add("no margin set, so equivalence was not assessed; a non-significant difference test is "
                    + "not evidence of sameness");
        } else {
            Conclusion c = eq.conclusion();
            String interval = String.format(Locale.ROOT, "the %s interval of the %s (%s, %s) %s",
                    Format.percent(eq.level()), eq.ratio() ? "ratio after/before" : "difference",
                    Format.equivalenceValue(eq, eq.ciLower(), decimals),
                    Format.equivalenceValue(eq, eq.ciUpper(), decimals), describeAgainstMargin(c));
            status = switch (c) {
                case EQUIVALENT, NON_INFERIOR, NON_SUPERIOR -> Status.PASSED;
                case NOT_EQUIVALENT, INFERIOR, SUPERIOR -> Status.FAILED;
                case INCONCLUSIVE -> Status.INCONCLUSIVE;
            };
            reasons.add(c.words() + ": " + interval + " " + Format.margin(eq, decimals));
        }
        if (r.spreadFailed()) {
            reasons.add(String.format(Locale.ROOT, "spread: the %s upper bound of sd(after)/sd(before) is %s, not "
                    + "below the limit %s", Format.percent(r.sdGrowth().level()), Format.ratio(r.sdGrowth().upperBound()),
                    Format.num(r.sdGrowth().limit())));
            if (status == Status.PASSED || status == Status.INCONCLUSIVE) {
                status = Status.FAILED;
            }
        }
        if (r.capabilityFailed()) {
            var cap = r.checks().after();
            reasons.add(String.format(Locale.ROOT, "capability: the %s lower bound of Ppk%s after the change is %s, "
                    + "not above the requirement %s", Format.percent(1 - cap.capabilityAlpha()), cap.modelWords(),
                    Format.ratio(cap.ppkLower()), Format.num(r.settings().capabilityRequirement())));
            if (status == Status.PASSED || status == Status.INCONCLUSIVE) {
                status = Status.FAILED;
            }
        }
        if (r.settings().tolerance() != null) {
            status = tolerance(r, decimals, reasons, status);
        }
        Stability st = r.checks() == null ? null : r.checks().stability();
        boolean required = Boolean.TRUE.equals(r.settings().requireStability());
        if (st != null) {
            // a finding, not a failure, unless the criteria require stability: then a signal of the after phase
            // fails the characteristic (docs/methods.md §16)
            for (boolean after : new boolean[] {false, true}) {
                String f = st.finding(after);
                if (f != null) {
                    reasons.add((after && required ? "stability required: " : "stability: ") + f);
                }
            }
            if (required && st.finding(true) != null && (status == Status.PASSED || status == Status.INCONCLUSIVE)) {
                status = Status.FAILED;
            }
        } else if (required && status == Status.PASSED) {
            // the requirement cannot be judged: the change is not shown to be stable
            reasons.add("stability required, but no control chart could be drawn (see the notes: the run order "
                    + "is not known or the limits could not be set), so stability is not shown");
            status = Status.INCONCLUSIVE;
        }
        return r.with(r.holmP(), new Verdict(status, reasons), r.notes());
    }

    /**
     * The tolerance-interval criterion (docs/methods.md §17): the after group's interval must lie inside the limits;
     * when it cannot be judged (no interval, no limits, too few values for the distribution-free confidence) the
     * characteristic cannot pass.
     */
    private static Status tolerance(CharacteristicResult r, int decimals, List<String> reasons, Status status) {
        reasons.add("tolerance: " + toleranceFinding(r, v -> Format.fixed(v, decimals)));
        return switch (r.toleranceState()) {
            case INSIDE, NOT_ASKED -> status;
            case OUTSIDE -> status == Status.PASSED || status == Status.INCONCLUSIVE ? Status.FAILED : status;
            case NOT_JUDGED, NOT_SHOWN -> status == Status.PASSED ? Status.INCONCLUSIVE : status;
        };
    }

    /**
     * The tolerance-interval criterion in words, as the verdict states it, e.g. "99 % / 95 % tolerance interval
     * (4.15250, 4.22622) inside the limits (4.1, 4.26)".
     *
     * @param r   a result whose criteria ask for a tolerance interval
     * @param num how to write the interval's ends
     * @return the sentence
     */
    public static String toleranceFinding(CharacteristicResult r, java.util.function.DoubleFunction<String> num) {
        String what = r.settings().tolerance().words() + " tolerance interval";
        var ti = r.checks() == null ? null : r.checks().after().tolerance();
        var spec = r.settings().spec();
        String limits = "(" + (spec.lsl() == null ? "no LSL" : Format.num(spec.lsl())) + ", "
                + (spec.usl() == null ? "no USL" : Format.num(spec.usl())) + ")";
        return switch (r.toleranceState()) {
            case NOT_ASKED -> "no tolerance interval asked for";
            case NOT_JUDGED -> ti == null ? what + " of the after group could not be computed (see the notes)"
                    : what + " cannot be judged: no specification limits are set";
            case NOT_SHOWN -> String.format(Locale.ROOT, "%s not shown: the distribution-free interval of %d values "
                    + "has only %s confidence", what, ti.n(), Format.percent(ti.achievedConfidence()));
            case INSIDE -> what + " " + Format.interval(ti, num) + " inside the limits " + limits;
            case OUTSIDE -> what + " " + Format.interval(ti, num) + " is not inside the limits " + limits;
        };
    }

    private static String describeAgainstMargin(Conclusion c) {
        return switch (c) {
            case EQUIVALENT -> "lies inside the margin";
            case NOT_EQUIVALENT -> "lies entirely outside the margin";
            case INCONCLUSIVE -> "straddles or touches a margin bound: more parts are needed";
            case NON_INFERIOR -> "lies above the lower margin";
            case INFERIOR -> "lies entirely below the lower margin";
            case NON_SUPERIOR -> "lies below the upper margin";
            case SUPERIOR -> "lies entirely above the upper margin";
        };
    }

    public static StudyResult overall(List<CharacteristicResult> results) {
        List<String> failing = new ArrayList<>();
        for (CharacteristicResult r : results) {
            if (r.verdict().status() != Status.PASSED) {
                failing.add(r.name() + ": " + r.verdict().status().words() + " ("
                        + String.join("; ", r.verdict().reasons()) + ")");
            }
        }
        int n = results.size();
        boolean verified = failing.isEmpty();
        long unassessable = results.stream().filter(r -> r.verdict().status() == Status.NOT_ASSESSABLE).count();
        String summary = verified
                ? String.format(Locale.ROOT, "CHANGE VERIFIED: all %d characteristic%s passed (equivalent within the "
                        + "agreed margin, every limit set met).", n, n == 1 ? "" : "s")
                : String.format(Locale.ROOT, "CHANGE NOT VERIFIED: %d of %d characteristic%s did not pass%s.",
                        failing.size(), n, n == 1 ? "" : "s", unassessable == 0 ? ""
                                : String.format(Locale.ROOT, "; %d could not be assessed from the data, and the change "
                                        + "cannot be verified until %s", unassessable, unassessable == 1 ? "it is"
                                                : "they are"));
        StudyResult draft = new StudyResult(results, verified, summary, failing);
        return new StudyResult(results, verified, summary + StudyResult.stabilityNote(draft.notInControl()), failing);
    }
}
