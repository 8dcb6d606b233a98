package org.holdpoint.workflow;

import java.nio.file.Path;
import org.holdpoint.importer.ImportRequest;
import org.holdpoint.study.Layout;

/**
 * Which files hold the before and after values, as the window asks for them: one file with both
 * groups, or a before file and an after file; the sheets may be left empty (first sheet with data).
 *
 * @param file        the one file holding both groups, or null
 * @param beforeFile  the before file (with {@code afterFile}), or null
 * @param afterFile   the after file, or null
 * @param sheet       sheet name or 1-based index of {@code file}, or null
 * @param beforeSheet sheet of {@code beforeFile}, or null
 * @param afterSheet  sheet of {@code afterFile}, or null
 * @param layout      the layout of the one file, or null to detect it (the import report states what was found)
 * @param columns     the columns, labels and header row named by the user ({@link ColumnMapping#NONE}: detect all)
 */
public record DataSources(Path file, Path beforeFile, Path afterFile, String sheet, String beforeSheet,
        String afterSheet, Layout layout, ColumnMapping columns) {

    /** Validates that exactly one of the two shapes is given. */
    public DataSources {
        boolean two = beforeFile != null || afterFile != null;
        if (file == null && !two) {
            throw new IllegalArgumentException("choose a data file, or a before file and an after file");
        }
        if (file != null && two) {
            throw new IllegalArgumentException("choose either one data file or a before and an after file, not both");
        }
        if (two && (beforeFile == null || afterFile == null)) {
            throw new IllegalArgumentException(beforeFile == null ? "choose the before file as well"
                    : "choose the after file as well");
        }
        sheet = blankToNull(sheet);
        beforeSheet = blankToNull(beforeSheet);
        afterSheet = blankToNull(afterSheet);
        columns = columns == null ? ColumnMapping.NONE : columns;
    }

    /**
     * Sources with every column detected.
     *
     * @param file        the one file holding both groups, or null
     * @param beforeFile  the before file, or null
     * @param afterFile   the after file, or null
     * @param sheet       sheet of {@code file}, or null
     * @param beforeSheet sheet of {@code beforeFile}, or null
     * @param afterSheet  sheet of {@code afterFile}, or null
     * @param layout      the layout of the one file, or null to detect it
     */
    public DataSources(Path file, Path beforeFile, Path afterFile, String sheet, String beforeSheet,
            String afterSheet, Layout layout) {
        this(file, beforeFile, afterFile, sheet, beforeSheet, afterSheet, layout, ColumnMapping.NONE);
    }

    /**
     * One file holding both groups, sheet detected.
     *
     * @param file the file
     * @return the sources
     */
    public static DataSources of(Path file) {
        return new DataSources(file, null, null, null, null, null, null, ColumnMapping.NONE);
    }

    /** @return the file beside which a criteria (settings) file is looked for: the one file, else the before file */
    public Path mainFile() {
        return file != null ? file : beforeFile;
    }

    /** @return the import request for these sources, with the named columns; everything else detected */
    ImportRequest toRequest() {
        ColumnMapping m = columns;
        ImportOptions o = file != null ? ImportOptions.file(file) : ImportOptions.files(beforeFile, afterFile);
        return o.sheets(sheet, beforeSheet, afterSheet).layout(layout, layout == Layout.PAIRED)
                .columns(m.group(), m.value(), m.characteristic(), m.before(), m.after())
                .labels(m.beforeLabel(), m.afterLabel()).traceColumns(m.unitId(), m.lot(), m.subgroup(), m.sequence())
                .text(null, null, m.headerRow()).toRequest();
    }

    private static String blankToNull(String s) {
        return s == null || s.isBlank() ? null : s.trim();
    }
}
