package org.holdpoint.workflow;

/** The tool's version, from the jar manifest (or "development" when run from classes). */
public final class Version {
    private Version() {
    }

    /** @return the version text */
    public static String get() {
        String v = Version.class.getPackage().getImplementationVersion();
        return v == null ? "0.1.0-development" : v;
    }
}
