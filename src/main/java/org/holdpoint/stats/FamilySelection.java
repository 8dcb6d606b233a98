package org.holdpoint.stats;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;

/**
 * The distribution family one characteristic's capability is judged by, chosen among every family its values
 * allow by Akaike's information criterion summed over its groups (Akaike 1974; Burnham &amp; Anderson 2002,
 * §2.6: a difference below 2 is no real preference, so the normal model is kept unless another family is better
 * by 2 or more), with each fit's Anderson–Darling statistic shown beside it
 * as a measure of fit in the tails (docs/methods.md §14). One family serves every group of the characteristic,
 * so that before and after are judged by the same model.
 *
 * @param chosen     the family chosen
 * @param automatic  whether it was chosen by AIC (false: set by the user or by the default rule)
 * @param reason     why, in words
 * @param candidates every family considered, best AIC first (refused families last)
 */
public record FamilySelection(DistributionFamily chosen, boolean automatic, String reason, List<Candidate> candidates) {

    /**
     * One family considered.
     *
     * @param family  the family
     * @param aic     the AIC summed over the groups, or null when it was not fitted
     * @param ad      the Anderson–Darling A² of each group's fit (before, after), or empty when not fitted
     * @param refusal why it was not fitted, or null
     */
    public record Candidate(DistributionFamily family, Double aic, List<Double> ad, String refusal) {
        /** Copies the list. */
        public Candidate {
            ad = List.copyOf(ad);
        }
    }

    /** An AIC difference below this is no real preference (Burnham &amp; Anderson 2002, §2.6). */
    public static final double NO_REAL_PREFERENCE = 2;

    /** Copies the list. */
    public FamilySelection {
        candidates = List.copyOf(candidates);
    }

    /**
     * A family set by the user or a rule, with no comparison.
     *
     * @param family the family
     * @param reason why
     * @return the selection
     */
    public static FamilySelection given(DistributionFamily family, String reason) {
        return new FamilySelection(family, false, reason, List.of());
    }

    /**
     * Fits every family to every group and takes the lowest summed AIC.
     *
     * @param groups the values of each group (before, after)
     * @return the selection
     * @throws StatsException when no family can be fitted
     */
    public static FamilySelection byAic(double[]... groups) {
        List<Candidate> fitted = new ArrayList<>();
        List<Candidate> refused = new ArrayList<>();
        for (DistributionFamily f : DistributionFamily.values()) {
            double aic = 0;
            List<Double> ad = new ArrayList<>();
            String refusal = null;
            for (double[] g : groups) {
                try {
                    FittedDistribution fit = DistributionFits.fit(f, g);
                    aic += fit.aic();
                    ad.add(fit.andersonDarling(g));
                } catch (StatsException e) {
                    refusal = e.getMessage().replaceFirst("^the " + f.key() + " family ", "");
                    break;
                }
            }
            if (refusal == null) {
                fitted.add(new Candidate(f, aic, ad, null));
            } else {
                refused.add(new Candidate(f, null, List.of(), refusal));
            }
        }
        if (fitted.isEmpty()) {
            throw new StatsException("no distribution family can be fitted to these values");
        }
        fitted.sort(Comparator.comparingDouble(Candidate::aic));
        Candidate best = fitted.get(0);
        StringBuilder why = new StringBuilder(String.format(Locale.ROOT, "%s has the lowest AIC (%.1f)",
                best.family().key(), best.aic()));
        if (fitted.size() > 1) {
            List<String> others = new ArrayList<>();
            for (Candidate c : fitted.subList(1, fitted.size())) {
                others.add(String.format(Locale.ROOT, "%s +%.1f", c.family().key(), c.aic() - best.aic()));
            }
            why.append("; then ").append(String.join(", ", others));
        }
        DistributionFamily chosen = best.family();
        for (Candidate c : fitted) {
            if (c.family() == DistributionFamily.NORMAL && best.family() != DistributionFamily.NORMAL
                    && c.aic() - best.aic() < NO_REAL_PREFERENCE) {
                chosen = DistributionFamily.NORMAL;
                why.append("; the normal model is within 2 of the lowest AIC, so it is kept");
            }
        }
        java.util.Map<String, List<String>> byReason = new java.util.LinkedHashMap<>();
        for (Candidate c : refused) {
            byReason.computeIfAbsent(c.refusal(), k -> new ArrayList<>()).add(c.family().key());
        }
        byReason.forEach((reason, families) -> why.append("; ").append(String.join(", ", families))
                .append(" not fitted: ").append(families.size() > 1 ? reason.replaceFirst("^needs ", "need ") : reason));
        List<Candidate> all = new ArrayList<>(fitted);
        all.addAll(refused);
        return new FamilySelection(chosen, true, why.toString(), all);
    }
}
