package org.holdpoint.workflow;

import java.util.Locale;

/**
 * A rule of the analysis (not of the numerics) says one characteristic cannot be assessed as given: too few
 * values, zero spread under an sd-growth limit, a paired design without matched units. It is reported on that
 * characteristic ("not assessable", with this message); the rest of the study goes on.
 */
public final class CharacteristicProblem extends RuntimeException {
    private static final long serialVersionUID = 1L;

    /**
     * @param template a {@link String#format} template, in words a user reads
     * @param args     its arguments
     */
    public CharacteristicProblem(String template, Object... args) {
        super(String.format(Locale.ROOT, template, args));
    }
}
