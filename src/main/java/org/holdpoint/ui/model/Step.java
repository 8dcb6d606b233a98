package org.holdpoint.ui.model;

/** The steps of a change study in the window, in working order. */
public enum Step {
    /** Describe the change. */
    CHANGE("Change", 'C', "What changed and why"),
    /** Open the before and after data. */
    DATA("Data", 'D', "Before and after measurements"),
    /** Set the criteria per characteristic. */
    CRITERIA("Criteria", 'R', "Limits, margins and requirements"),
    /** Read the results. */
    RESULTS("Results", 'E', "Verdict per characteristic"),
    /** Plan how many parts a trial needs. */
    PLAN("Plan", 'P', "Parts needed for a target power"),
    /** Sign and save. */
    SIGN_OFF("Sign-off", 'S', "Sign, save and write the record");

    private final String title;
    private final char mnemonic;
    private final String hint;

    Step(String title, char mnemonic, String hint) {
        this.title = title;
        this.mnemonic = mnemonic;
        this.hint = hint;
    }

    /** @return the step's name */
    public String title() {
        return title;
    }

    /** @return the letter that selects it with Alt */
    public char mnemonic() {
        return mnemonic;
    }

    /** @return a one-line description */
    public String hint() {
        return hint;
    }
}
