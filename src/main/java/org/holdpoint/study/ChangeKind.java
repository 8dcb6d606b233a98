package org.holdpoint.study;

/** The kind of process change under study. */
public enum ChangeKind {
    /** A cutting tool, insert, mould, die or fixture. */
    TOOLING("tooling"),
    /** Another machine or cell. */
    MACHINE("machine"),
    /** A new material or material lot. */
    MATERIAL("material"),
    /** A second-source or new supplier. */
    SUPPLIER("supplier"),
    /** A new process or measurement method. */
    METHOD("method"),
    /** Anything else. */
    OTHER("other");

    private final String words;

    ChangeKind(String words) {
        this.words = words;
    }

    /** @return the kind in words */
    public String words() {
        return words;
    }

    /**
     * Parses a kind from its words or name, case-insensitively.
     *
     * @param text e.g. "supplier"
     * @return the kind
     * @throws IllegalArgumentException naming the allowed values
     */
    public static ChangeKind parse(String text) {
        for (ChangeKind k : values()) {
            if (k.words.equalsIgnoreCase(text.trim()) || k.name().equalsIgnoreCase(text.trim())) {
                return k;
            }
        }
        throw new IllegalArgumentException("'" + text + "' is not a kind of change; use tooling, machine, material, "
                + "supplier, method or other");
    }
}
