package org.holdpoint.stats;

/** The t-based comparison behind a difference or equivalence result, with the name shown to users. */
public enum LocationMethod {
    /** Welch 1947 two-sample t with Welch–Satterthwaite df (Satterthwaite 1946). */
    WELCH("Welch two-sample t, Welch-Satterthwaite df"),
    /** Student's two-sample t with pooled variance, df = n_a + n_b − 2. */
    POOLED("pooled two-sample t (equal variances asserted), df = n_a + n_b - 2"),
    /** Student's one-sample t on the paired differences after − before, df = n − 1. */
    PAIRED("paired t on the differences after - before, df = n - 1");

    private final String description;

    LocationMethod(String description) {
        this.description = description;
    }

    /** @return the method as named in every output */
    public String description() {
        return description;
    }
}
