package org.holdpoint.ui.model;

import java.time.Clock;
import java.time.OffsetDateTime;
import java.time.format.DateTimeFormatter;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.List;
import org.holdpoint.study.Signature;

/** The Sign-off step: the signature being entered and the signatures so far. Lives on the event thread. */
public final class SignOffForm {
    /** The bound properties. */
    public enum Property {
        /** A signature was added or the list replaced. */
        SIGNATURES
    }

    private final Bound<Property> bound = new Bound<>(this, Property.class);
    private final List<Signature> signatures = new ArrayList<>();
    private final Clock clock;
    /** The SHA-256 of the record as it stands now, or null while it is not known (edited since last computed). */
    private String currentRecord;
    private Runnable onEdit = () -> { };

    /**
     * @param clock the clock that stamps signatures
     */
    public SignOffForm(Clock clock) {
        this.clock = clock;
    }

    /**
     * Why a signature cannot be added yet, or null when it can.
     *
     * @param name    printed name
     * @param role    role
     * @param meaning what the signature means
     * @return the reason in plain words, or null
     */
    public static String problem(String name, String role, String meaning) {
        if (name == null || name.isBlank()) {
            return "Enter the printed name of the person signing.";
        }
        if (role == null || role.isBlank()) {
            return "Enter the role or title of the person signing.";
        }
        if (meaning == null || meaning.isBlank()) {
            return "Say what the signature means, e.g. \"approved for production\".";
        }
        return null;
    }

    /**
     * Adds a signature stamped with the current time and bound to the record it signs.
     *
     * @param stage   prepared, reviewed or approved
     * @param name    printed name
     * @param role    role
     * @param meaning what it means
     * @param record  the SHA-256 of the record signed (the study without its signatures, as analysed now)
     * @return the signature
     * @throws IllegalArgumentException with {@link #problem} when a field is missing
     */
    public Signature sign(Signature.Stage stage, String name, String role, String meaning, String record) {
        String p = problem(name, role, meaning);
        if (p != null) {
            throw new IllegalArgumentException(p);
        }
        if (record == null || record.length() != 64) {
            throw new IllegalArgumentException("a signature is bound to the SHA-256 of the record it signs");
        }
        String ts = OffsetDateTime.now(clock).truncatedTo(ChronoUnit.SECONDS).format(DateTimeFormatter.ISO_OFFSET_DATE_TIME);
        Signature s = new Signature(stage, name.trim(), role.trim(), meaning.trim(), ts, record);
        currentRecord = record;
        signatures.add(s);
        bound.fireChanged(Property.SIGNATURES);
        onEdit.run();
        return s;
    }

    /**
     * The record as it stands now: signatures bound to another record are void.
     *
     * @param sha256 the SHA-256 of the current record, or null when it changed and is not computed yet
     */
    public void setCurrentRecord(String sha256) {
        if (!java.util.Objects.equals(sha256, currentRecord)) {
            currentRecord = sha256;
            bound.fireChanged(Property.SIGNATURES);
        }
    }

    /** @return the SHA-256 of the record as it stands now, or null when not known */
    public String currentRecord() {
        return currentRecord;
    }

    /**
     * Whether a signature no longer applies: it signed a record that has since changed (other results,
     * criteria, data or change description). A signature made before records were bound (none) is judged
     * when the record is written.
     *
     * @param s a signature of this form
     * @return true when it is void
     */
    public boolean isVoid(Signature s) {
        return s.record() != null && !s.record().equals(currentRecord);
    }

    /** @return how many signatures are void */
    public int voidCount() {
        return (int) signatures.stream().filter(this::isVoid).count();
    }

    /**
     * Removes the void signatures (they signed an earlier record; the record they signed is no longer the
     * one that will be written). Valid signatures stay.
     *
     * @return how many were removed
     */
    public int removeVoid() {
        int before = signatures.size();
        signatures.removeIf(this::isVoid);
        int removed = before - signatures.size();
        if (removed > 0) {
            bound.fireChanged(Property.SIGNATURES);
            onEdit.run();
        }
        return removed;
    }

    /** @return the signatures so far */
    public List<Signature> signatures() {
        return List.copyOf(signatures);
    }

    /**
     * Replaces the signatures (opening a study file).
     *
     * @param list the signatures
     */
    public void load(List<Signature> list) {
        signatures.clear();
        signatures.addAll(list);
        currentRecord = null;
        bound.fireChanged(Property.SIGNATURES);
    }

    /**
     * @param property the property
     * @param listener told of changes, on the event thread
     */
    public void addListener(Property property, java.beans.PropertyChangeListener listener) {
        bound.addListener(property, listener);
    }

    void onEdit(Runnable r) {
        onEdit = r;
    }
}
