package org.holdpoint.stats;

/** Which extreme an outlier test looks at. */
public enum OutlierSide {
    /** The value farthest from the mean, either side: G = max|x − x̄|/s. */
    TWO_SIDED,
    /** The largest value only: G⁺ = (x_(n) − x̄)/s. */
    MAXIMUM,
    /** The smallest value only: G⁻ = (x̄ − x_(1))/s. */
    MINIMUM
}
