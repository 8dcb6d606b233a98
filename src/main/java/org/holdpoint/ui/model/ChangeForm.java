package org.holdpoint.ui.model;

import java.beans.PropertyChangeListener;
import java.util.EnumMap;
import java.util.Map;
import org.holdpoint.study.ChangeDescription;
import org.holdpoint.study.ChangeKind;

/** The Change step: what changed and why, as typed; every field is a bound property. */
public final class ChangeForm {
    /** The fields of the form, each a bound property. */
    public enum Field {
        /** The change id. */
        ID("Change id"),
        /** A one-line title. */
        TITLE("Title"),
        /** The kind of change (its value is a {@link ChangeKind}'s words). */
        KIND("Kind of change"),
        /** The part number. */
        PART_NUMBER("Part number"),
        /** The part revision. */
        REVISION("Revision"),
        /** Why the change is made. */
        REASON("Reason"),
        /** Who requested it. */
        REQUESTER("Requested by"),
        /** When it was requested (yyyy-mm-dd). */
        REQUEST_DATE("Requested on"),
        /** When the study was made (yyyy-mm-dd). */
        STUDY_DATE("Study date");

        private final String label;

        Field(String label) {
            this.label = label;
        }

        /** @return the label shown beside the field */
        public String label() {
            return label;
        }
    }

    private final Bound<Field> bound = new Bound<>(this, Field.class);
    private final Map<Field, String> values = new EnumMap<>(Field.class);
    private Runnable onEdit = () -> { };

    /** Creates an empty form of kind "other". */
    public ChangeForm() {
        for (Field f : Field.values()) {
            values.put(f, "");
        }
        values.put(Field.KIND, ChangeKind.OTHER.words());
    }

    /**
     * @param f the field
     * @return its text, never null
     */
    public String get(Field f) {
        return values.get(f);
    }

    /**
     * Sets a field as typed and tells the listeners. Called on the event thread.
     *
     * @param f    the field
     * @param text the text (null is taken as empty)
     * @throws IllegalArgumentException when {@code f} is {@link Field#KIND} and the text is no kind of change
     */
    public void set(Field f, String text) {
        String t = text == null ? "" : text;
        if (f == Field.KIND) {
            t = ChangeKind.parse(t).words();
        }
        String old = values.put(f, t);
        if (!t.equals(old)) {
            bound.fire(f, old, t);
            onEdit.run();
        }
    }

    /** @return the kind of change */
    public ChangeKind kind() {
        return ChangeKind.parse(values.get(Field.KIND));
    }

    /**
     * Why a field's text cannot be stored, or null when it can: the two dates must be calendar dates written
     * yyyy-mm-dd (ISO 8601), or empty.
     *
     * @param f the field
     * @return the problem in plain words, or null
     */
    public String problem(Field f) {
        if (f != Field.REQUEST_DATE && f != Field.STUDY_DATE) {
            return null;
        }
        String t = get(f).trim();
        if (t.isEmpty()) {
            return null;
        }
        try {
            java.time.LocalDate.parse(t);
            return null;
        } catch (java.time.format.DateTimeParseException e) {
            return "Write the date as year-month-day, e.g. 2026-11-27 (got \"" + t + "\").";
        }
    }

    /**
     * @return the description as the study stores it
     * @throws IllegalArgumentException when a date is not a date (with {@link #problem}'s words)
     */
    public ChangeDescription toDescription() {
        for (Field f : new Field[] {Field.REQUEST_DATE, Field.STUDY_DATE}) {
            if (problem(f) != null) {
                throw new IllegalArgumentException(f.label() + ": " + problem(f));
            }
        }
        return new ChangeDescription(get(Field.ID).trim(), get(Field.TITLE).trim(), kind(),
                get(Field.PART_NUMBER).trim(), get(Field.REVISION).trim(), get(Field.REASON).trim(),
                get(Field.REQUESTER).trim(), blankToNull(get(Field.REQUEST_DATE)), blankToNull(get(Field.STUDY_DATE)));
    }

    private static String blankToNull(String s) {
        return s == null || s.isBlank() ? null : s.trim();
    }

    /**
     * Shows a stored description (without counting it as an edit).
     *
     * @param d the description
     */
    public void load(ChangeDescription d) {
        Runnable keep = onEdit;
        onEdit = () -> { };
        try {
            set(Field.ID, "unnamed change".equals(d.id()) ? "" : d.id());
            set(Field.TITLE, d.title());
            set(Field.KIND, d.kind().words());
            set(Field.PART_NUMBER, d.partNumber());
            set(Field.REVISION, d.revision());
            set(Field.REASON, d.reason());
            set(Field.REQUESTER, d.requester());
            set(Field.REQUEST_DATE, d.requestDate() == null ? "" : d.requestDate());
            set(Field.STUDY_DATE, d.studyDate() == null ? "" : d.studyDate());
        } finally {
            onEdit = keep;
        }
    }

    /**
     * @param f        the field
     * @param listener told of every change of it, on the event thread
     */
    public void addListener(Field f, PropertyChangeListener listener) {
        bound.addListener(f, listener);
    }

    void onEdit(Runnable r) {
        onEdit = r;
    }
}
