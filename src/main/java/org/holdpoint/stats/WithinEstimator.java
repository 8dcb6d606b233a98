package org.holdpoint.stats;

/** The estimator of the within-subgroup (short-term) sd behind Cp and Cpk, named in every output. */
public enum WithinEstimator {
    /** s_p/c4(d + 1), s_p = √(ΣΣ(x_ij − x̄_i)²/d), d = Σ(n_i − 1): pooled within-subgroup sd, unbiased. */
    POOLED_SD("pooled within-subgroup sd s_p/c4(d+1)"),
    /** MR̄/d2(2) over consecutive values in run order (individual values). */
    MOVING_RANGE("average moving range MRbar/d2(2), individual values in run order");

    private final String description;

    WithinEstimator(String description) {
        this.description = description;
    }

    /** @return the estimator as named in every output */
    public String description() {
        return description;
    }
}
