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
     * Adds a signature stamped with the current time.
     *
     * @param stage   prepared, reviewed or approved
     * @param name    printed name
     * @param role    role
     * @param meaning what it means
     * @return the signature
     * @throws IllegalArgumentException with {@link #problem} when a field is missing
     */
    public Signature sign(Signature.Stage stage, String name, String role, String meaning) {
        String p = problem(name, role, meaning);
        if (p != null) {
            throw new IllegalArgumentException(p);
        }
        String ts = OffsetDateTime.now(clock).truncatedTo(ChronoUnit.SECONDS).format(DateTimeFormatter.ISO_OFFSET_DATE_TIME);
        Signature s = new Signature(stage, name.trim(), role.trim(), meaning.trim(), ts);
        signatures.add(s);
        bound.fireChanged(Property.SIGNATURES);
        onEdit.run();
        return s;
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
