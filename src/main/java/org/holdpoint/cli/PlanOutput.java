package org.holdpoint.cli;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.holdpoint.stats.Design;
import org.holdpoint.stats.PlanResult;
import org.holdpoint.stats.PowerPoint;
import org.holdpoint.stats.SuccessRunResult;

/** Formats planning results as text for the console and as a JSON document (key order fixed). */
final class PlanOutput {
    private PlanOutput() {
    }

    /** The console text of an equivalence plan. */
    static String text(PlanResult r) {
        StringBuilder b = new StringBuilder();
        boolean pairs = r.design() == Design.PAIRED;
        b.append("Equivalence trial plan (two one-sided tests, exact power)\n");
        line(b, "design", pairs ? "paired (sd of the differences)" : "two groups, pooled sd");
        line(b, "alpha", r.alpha() + " per one-sided test");
        line(b, "margin", Double.isInfinite(r.marginLower()) ? "upper bound only: " + r.marginUpper()
                + " (non-superiority, one one-sided test)" : Double.isInfinite(r.marginUpper())
                ? "lower bound only: " + r.marginLower() + " (non-inferiority, one one-sided test)"
                : r.marginLower() + " to " + r.marginUpper());
        line(b, "expected difference", Double.toString(r.difference()));
        line(b, "sd", Double.toString(r.sd()));
        if (r.targetPower() != null) {
            line(b, "target power", r.targetPower().toString());
        }
        if (pairs) {
            line(b, "pairs", Integer.toString(r.n()));
        } else if (r.ratio() == 1) {
            line(b, "n per group", Integer.toString(r.n()));
        } else {
            line(b, "n before", Integer.toString(r.n()));
            line(b, "n after", r.nAfter() + " (ratio " + r.ratio() + ")");
        }
        line(b, "power", p(r.achievedPower()));
        line(b, "power at n - 1", r.powerAtPrevious() == null ? "- (no degree of freedom)" : p(r.powerAtPrevious()));
        line(b, "t-test power", p(r.tTestPower()) + " (two-sided difference test at alpha " + r.alpha() + ")");
        b.append("Power by true difference at this size:\n");
        b.append(String.format(Locale.ROOT, "  %14s  %9s%n", "difference", "power"));
        for (PowerPoint pt : r.powerTable()) {
            b.append(String.format(Locale.ROOT, "  %14.6g  %9.6f%n", pt.difference(), pt.power()));
        }
        return b.toString();
    }

    /** The console text of a pass/fail plan. */
    static String text(SuccessRunResult r) {
        StringBuilder b = new StringBuilder("Pass/fail plan (success run, binomial)\n");
        line(b, "confidence", Double.toString(r.confidence()));
        line(b, "reliability", Double.toString(r.reliability()));
        line(b, "failures allowed", Integer.toString(r.failures()));
        line(b, "parts to test", Integer.toString(r.n()));
        line(b, "achieved confidence", p(r.achievedConfidence()));
        return b.toString();
    }

    /** The JSON document of an equivalence plan: inputs, then nPerGroup or nPairs, nAfter, powers, table. */
    static Map<String, Object> json(PlanResult r) {
        Map<String, Object> m = new LinkedHashMap<>();
        boolean pairs = r.design() == Design.PAIRED;
        m.put("design", pairs ? "paired" : "parallel");
        m.put("alpha", r.alpha());
        // an absent bound of a one-sided margin is null, never an infinity (not valid JSON)
        m.put("marginLower", Double.isInfinite(r.marginLower()) ? null : r.marginLower());
        m.put("marginUpper", Double.isInfinite(r.marginUpper()) ? null : r.marginUpper());
        m.put("difference", r.difference());
        m.put("sd", r.sd());
        if (!pairs) {
            m.put("ratio", r.ratio());
        }
        if (r.targetPower() != null) {
            m.put("targetPower", r.targetPower());
        }
        m.put(pairs ? "nPairs" : "nPerGroup", r.n());
        if (!pairs && r.ratio() != 1) {
            m.put("nAfter", r.nAfter());
        }
        m.put("achievedPower", r.achievedPower());
        if (r.powerAtPrevious() != null) {
            m.put("powerAtNMinus1", r.powerAtPrevious());
        }
        m.put("tTestPower", r.tTestPower());
        List<Map<String, Object>> table = new ArrayList<>();
        for (PowerPoint pt : r.powerTable()) {
            Map<String, Object> row = new LinkedHashMap<>();
            row.put("difference", pt.difference());
            row.put("power", pt.power());
            table.add(row);
        }
        m.put("powerTable", table);
        return m;
    }

    /** The JSON document of a pass/fail plan. */
    static Map<String, Object> json(SuccessRunResult r) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("confidence", r.confidence());
        m.put("reliability", r.reliability());
        m.put("failures", r.failures());
        m.put("nParts", r.n());
        m.put("achievedConfidence", r.achievedConfidence());
        return m;
    }

    private static void line(StringBuilder b, String label, String value) {
        b.append(String.format(Locale.ROOT, "  %-20s %s%n", label, value));
    }

    private static String p(double value) {
        return String.format(Locale.ROOT, "%.6f", value);
    }
}
