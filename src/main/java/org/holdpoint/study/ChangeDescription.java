package org.holdpoint.study;

/**
 * What changed and why: the header of a change record. Any field but the id may be empty.
 *
 * @param id          the change id, e.g. "CR-2026-0412"
 * @param title       a one-line title
 * @param kind        the kind of change
 * @param partNumber  the part number
 * @param revision    the part revision
 * @param reason      why the change is made
 * @param requester   who requested it
 * @param requestDate the date it was requested (ISO yyyy-mm-dd), or null
 * @param studyDate   the date of the study (ISO yyyy-mm-dd), or null
 */
public record ChangeDescription(String id, String title, ChangeKind kind, String partNumber, String revision,
        String reason, String requester, String requestDate, String studyDate) {

    /** An empty description with a placeholder id. */
    public static final ChangeDescription NONE = new ChangeDescription("unnamed change", "", ChangeKind.OTHER, "", "",
            "", "", null, null);

    /** Normalises nulls. */
    public ChangeDescription {
        id = id == null || id.isBlank() ? "unnamed change" : id;
        title = title == null ? "" : title;
        kind = kind == null ? ChangeKind.OTHER : kind;
        partNumber = partNumber == null ? "" : partNumber;
        revision = revision == null ? "" : revision;
        reason = reason == null ? "" : reason;
        requester = requester == null ? "" : requester;
    }
}
