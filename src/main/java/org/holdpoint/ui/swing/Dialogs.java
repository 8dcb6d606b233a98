package org.holdpoint.ui.swing;

import java.awt.Component;
import java.io.File;
import java.nio.file.Path;
import javax.swing.JFileChooser;
import javax.swing.JOptionPane;
import javax.swing.filechooser.FileNameExtensionFilter;
import org.holdpoint.ui.model.RecentFiles;
import org.holdpoint.ui.model.UserMessage;

/** File choosers that start in the last folder, and problems told in plain words. Event thread only. */
final class Dialogs {
    /** The extension of study files. */
    static final String STUDY_SUFFIX = ".holdpoint.json";
    private final Component parent;
    private final RecentFiles recent;

    Dialogs(Component parent, RecentFiles recent) {
        this.parent = parent;
        this.recent = recent;
    }

    /** @return a data file chosen by the user, or null */
    Path chooseData(String title) {
        JFileChooser fc = chooser(title);
        fc.setFileFilter(new FileNameExtensionFilter("Spreadsheets and text (xlsx, xls, csv, tsv, txt)", "xlsx",
                "xls", "csv", "tsv", "txt"));
        return fc.showOpenDialog(parent) == JFileChooser.APPROVE_OPTION ? remember(fc.getSelectedFile()) : null;
    }

    /** @return a study file to open, or null */
    Path chooseStudy() {
        JFileChooser fc = chooser("Open a study file");
        fc.setFileFilter(new FileNameExtensionFilter("Holdpoint study files (*.holdpoint.json)", "json"));
        return fc.showOpenDialog(parent) == JFileChooser.APPROVE_OPTION ? remember(fc.getSelectedFile()) : null;
    }

    /** @return where to save, with the suffix added, or null; asks before replacing a file */
    Path chooseSave(String title, String suggested, String suffix) {
        JFileChooser fc = chooser(title);
        fc.setSelectedFile(new File(fc.getCurrentDirectory(), suggested));
        if (fc.showSaveDialog(parent) != JFileChooser.APPROVE_OPTION) {
            return null;
        }
        Path p = withSuffix(fc.getSelectedFile().toPath(), suffix);
        if (p.toFile().exists() && JOptionPane.showConfirmDialog(parent, p.getFileName()
                + " exists already. Replace it?", title, JOptionPane.YES_NO_OPTION,
                JOptionPane.WARNING_MESSAGE) != JOptionPane.YES_OPTION) {
            return null;
        }
        return remember(p.toFile());
    }

    /**
     * The name the user typed with the suffix added only when it lacks the suffix's extension: "x" and
     * "x.holdpoint" become "x.holdpoint.json", "x.json" stays "x.json" (never "x.json.holdpoint.json").
     *
     * @param p      the chosen path
     * @param suffix e.g. ".holdpoint.json" or ".xlsx"
     * @return the path to write
     */
    static Path withSuffix(Path p, String suffix) {
        String name = p.getFileName().toString();
        String lower = name.toLowerCase(java.util.Locale.ROOT);
        String ext = suffix.substring(suffix.lastIndexOf('.')).toLowerCase(java.util.Locale.ROOT);
        if (lower.endsWith(suffix.toLowerCase(java.util.Locale.ROOT)) || lower.endsWith(ext)) {
            return p;
        }
        String stem = suffix.substring(0, suffix.lastIndexOf('.'));
        if (!stem.isEmpty() && lower.endsWith(stem.toLowerCase(java.util.Locale.ROOT))) {
            return p.resolveSibling(name + ext);
        }
        return p.resolveSibling(name + suffix);
    }

    /** Tells a problem: heading, what happened, what to do. */
    void tell(UserMessage m) {
        String html = "<html><body style='width: 420px'><p><b>" + esc(m.what()).replace("\n", "<br>")
                + "</b></p>" + (m.whatToDo().isEmpty() ? "" : "<p style='margin-top:8px'>" + esc(m.whatToDo())
                + "</p>") + "</body></html>";
        JOptionPane.showMessageDialog(parent, html, m.title(), JOptionPane.WARNING_MESSAGE);
    }

    private JFileChooser chooser(String title) {
        Path last = recent.lastFolder();
        JFileChooser fc = new JFileChooser(last == null ? null : last.toFile());
        fc.setDialogTitle(title);
        return fc;
    }

    private Path remember(File f) {
        if (f.getParentFile() != null) {
            recent.setLastFolder(f.getParentFile().toPath());
        }
        return f.toPath();
    }

    static String esc(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;");
    }
}
