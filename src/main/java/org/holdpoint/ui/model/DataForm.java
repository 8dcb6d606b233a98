package org.holdpoint.ui.model;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.EnumMap;
import java.util.Map;
import org.holdpoint.workflow.ColumnMapping;
import org.holdpoint.workflow.DataSources;

/**
 * The Data step's choice of files, sheets, layout and column mapping (blank = detected), as typed, chosen
 * or dropped. Lives on the event thread.
 */
public final class DataForm {
    /** How the before and after values are supplied. */
    public enum Source {
        /** One file holds both groups. */
        ONE_FILE("one file with both groups"),
        /** A before file and an after file. */
        TWO_FILES("a before file and an after file");

        private final String words;

        Source(String words) {
            this.words = words;
        }

        @Override
        public String toString() {
            return words;
        }
    }

    /** The bound properties (each field of the form). */
    public enum Property {
        /** The source choice. */
        SOURCE,
        /** The one file. */
        FILE,
        /** The before file. */
        BEFORE,
        /** The after file. */
        AFTER,
        /** The sheet of the one file. */
        SHEET,
        /** The layout of the one file (null: detect). */
        LAYOUT,
        /** A field of the column mapping (the new value is the {@link MappingField}'s text). */
        MAPPING
    }

    private final Map<MappingField, String> mapping = new EnumMap<>(MappingField.class);

    /**
     * @param f the field
     * @return the text typed in the mapping field ("" when blank: detected)
     */
    public String mapping(MappingField f) {
        return mapping.getOrDefault(f, "");
    }

    /**
     * @param f    the field
     * @param text the text typed (blank: detect it)
     */
    public void setMapping(MappingField f, String text) {
        String old = mapping(f);
        mapping.put(f, text == null ? "" : text);
        bound.fire(Property.MAPPING, old, mapping(f));
    }

    /**
     * The column mapping as typed.
     *
     * @return the mapping
     * @throws IllegalArgumentException in plain words when the header row is not a row number
     */
    public ColumnMapping columnMapping() {
        String h = mapping(MappingField.HEADER_ROW).strip();
        Integer header = null;
        if (!h.isEmpty()) {
            try {
                header = Integer.valueOf(h);
            } catch (NumberFormatException e) {
                header = -1;
            }
            if (header < 1) {
                throw new IllegalArgumentException("The header row \"" + h + "\" is not a row number.");
            }
        }
        return new ColumnMapping(mapping(MappingField.GROUP), mapping(MappingField.VALUE),
                mapping(MappingField.CHARACTERISTIC), mapping(MappingField.BEFORE), mapping(MappingField.AFTER),
                mapping(MappingField.BEFORE_LABEL), mapping(MappingField.AFTER_LABEL), mapping(MappingField.UNIT_ID),
                mapping(MappingField.LOT), mapping(MappingField.SUBGROUP), mapping(MappingField.SEQUENCE), header);
    }

    private void showMapping(ColumnMapping m) {
        String[] v = {m.group(), m.value(), m.characteristic(), m.before(), m.after(), m.beforeLabel(),
            m.afterLabel(), m.unitId(), m.lot(), m.subgroup(), m.sequence(),
            m.headerRow() == null ? null : m.headerRow().toString()};
        for (MappingField f : MappingField.values()) {
            setMapping(f, v[f.ordinal()]);
        }
    }

    private org.holdpoint.study.Layout layout;

    /** @return the layout chosen for the one file, or null to detect it */
    public org.holdpoint.study.Layout layout() {
        return layout;
    }

    /** @param l the layout of the one file, or null to detect it */
    public void setLayout(org.holdpoint.study.Layout l) {
        org.holdpoint.study.Layout old = layout;
        layout = l;
        bound.fire(Property.LAYOUT, old, l);
    }

    private final Bound<Property> bound = new Bound<>(this, Property.class);
    private Source source = Source.ONE_FILE;
    private Path file;
    private Path before;
    private Path after;
    private String sheet = "";

    /** @return the source choice */
    public Source source() {
        return source;
    }

    /** @param s the source choice */
    public void setSource(Source s) {
        Source old = source;
        source = s;
        bound.fire(Property.SOURCE, old, s);
    }

    /** @return the one file, or null */
    public Path file() {
        return file;
    }

    /** @param p the one file */
    public void setFile(Path p) {
        Path old = file;
        file = p;
        bound.fire(Property.FILE, old, p);
    }

    /** @return the before file, or null */
    public Path before() {
        return before;
    }

    /** @param p the before file */
    public void setBefore(Path p) {
        Path old = before;
        before = p;
        bound.fire(Property.BEFORE, old, p);
    }

    /** @return the after file, or null */
    public Path after() {
        return after;
    }

    /** @param p the after file */
    public void setAfter(Path p) {
        Path old = after;
        after = p;
        bound.fire(Property.AFTER, old, p);
    }

    /** @return the sheet as typed ("" for the first sheet with data) */
    public String sheet() {
        return sheet;
    }

    /** @param s the sheet name or 1-based number */
    public void setSheet(String s) {
        String old = sheet;
        sheet = s == null ? "" : s;
        bound.fire(Property.SHEET, old, sheet);
    }

    /** Swaps the before and after files. */
    public void swap() {
        Path b = before;
        setBefore(after);
        setAfter(b);
    }

    /**
     * Takes files dropped on the window: one file is the one file; two are the before and the after
     * file (the one whose name says "before", else the first by name, is the before file).
     *
     * @param files the dropped files
     * @throws IllegalArgumentException with a plain-words reason for none or more than two files
     */
    public void drop(List<Path> files) {
        if (files.isEmpty() || files.size() > 2) {
            throw new IllegalArgumentException("Drop one file holding both groups, or two files (before and after); "
                    + files.size() + " were dropped.");
        }
        if (files.size() == 1) {
            setSource(Source.ONE_FILE);
            setFile(files.get(0));
            return;
        }
        List<Path> l = new ArrayList<>(files);
        l.sort((a, b) -> a.getFileName().toString().compareToIgnoreCase(b.getFileName().toString()));
        if (name(l.get(1)).contains("before") && !name(l.get(0)).contains("before")
                || name(l.get(0)).contains("after") && !name(l.get(1)).contains("after")) {
            java.util.Collections.reverse(l);
        }
        setSource(Source.TWO_FILES);
        setBefore(l.get(0));
        setAfter(l.get(1));
    }

    private static String name(Path p) {
        return p.getFileName().toString().toLowerCase(Locale.ROOT);
    }

    /**
     * The files to import.
     *
     * @return the sources
     * @throws IllegalArgumentException saying which file is still to be chosen, or that the header row is not a number
     */
    public DataSources toSources() {
        if (source == Source.ONE_FILE) {
            if (file == null) {
                throw new IllegalArgumentException("Choose the data file first (or drop it on the window).");
            }
            return new DataSources(file, null, null, sheet, null, null, layout, columnMapping());
        }
        if (before == null || after == null) {
            throw new IllegalArgumentException(before == null ? "Choose the before file first."
                    : "Choose the after file first.");
        }
        return new DataSources(null, before, after, null, sheet, sheet, null, columnMapping());
    }

    /**
     * Shows sources (the demo, or a re-opened study).
     *
     * @param s the sources
     */
    public void show(DataSources s) {
        if (s.file() != null) {
            setSource(Source.ONE_FILE);
            setFile(s.file());
            setSheet(s.sheet());
            setLayout(s.layout());
        } else {
            setSource(Source.TWO_FILES);
            setBefore(s.beforeFile());
            setAfter(s.afterFile());
            setSheet(s.beforeSheet());
        }
        showMapping(s.columns());
    }

    /**
     * @param property the property
     * @param listener told of changes, on the event thread
     */
    public void addListener(Property property, java.beans.PropertyChangeListener listener) {
        bound.addListener(property, listener);
    }
}
