package org.holdpoint.workflow;

import java.util.List;
import java.util.Locale;

/**
 * A change study that cannot be analysed as given (bad settings, a characteristic with zero spread,
 * too few values): one or more plain-language problems, each naming the characteristic and what to do.
 */
public final class AnalysisException extends RuntimeException {
    private static final long serialVersionUID = 1L;
    private final List<String> problems;

    /**
     * @param problems the problems, one sentence each
     */
    public AnalysisException(List<String> problems) {
        super(String.join(System.lineSeparator(), problems));
        this.problems = List.copyOf(problems);
    }

    /**
     * @param template a message template, formatted with {@link Locale#ROOT}
     * @param args     its values
     */
    public AnalysisException(String template, Object... args) {
        this(List.of(String.format(Locale.ROOT, template, args)));
    }

    /** @return the problems, one sentence each */
    public List<String> problems() {
        return problems;
    }
}
