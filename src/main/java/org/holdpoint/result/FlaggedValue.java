package org.holdpoint.result;

import org.holdpoint.study.Origin;

/**
 * A value flagged as a possible outlier: flagged, never dropped.
 *
 * @param group  "before" or "after"
 * @param value  the value
 * @param origin where it came from
 * @param test   the test that flagged it, e.g. "generalized ESD"
 */
public record FlaggedValue(String group, double value, Origin origin, String test) {
}
