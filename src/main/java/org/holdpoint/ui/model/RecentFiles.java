package org.holdpoint.ui.model;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/** The recently used files (newest first, at most {@link #MAX}) and the last folder, kept between runs. */
public final class RecentFiles {
    /** How many recent files are remembered. */
    public static final int MAX = 8;
    private static final String SEP = "\n";
    private final PreferenceStore store;

    /**
     * @param store where to keep them
     */
    public RecentFiles(PreferenceStore store) {
        this.store = store;
    }

    /** @return the recent files, newest first */
    public List<Path> list() {
        String s = store.get("recent");
        List<Path> l = new ArrayList<>();
        if (s != null) {
            for (String p : s.split(SEP)) {
                if (!p.isBlank()) {
                    l.add(Path.of(p));
                }
            }
        }
        return l;
    }

    /**
     * Puts a file first in the list (and its folder as the last folder).
     *
     * @param file the file used
     */
    public void add(Path file) {
        Path abs = file.toAbsolutePath().normalize();
        List<Path> l = list();
        l.remove(abs);
        l.add(0, abs);
        while (l.size() > MAX) {
            l.remove(l.size() - 1);
        }
        store.put("recent", String.join(SEP, l.stream().map(Path::toString).toList()));
        if (abs.getParent() != null) {
            setLastFolder(abs.getParent());
        }
    }

    /** @return the folder last used, or null */
    public Path lastFolder() {
        String s = store.get("lastFolder");
        return s == null ? null : Path.of(s);
    }

    /**
     * @param folder the folder last used
     */
    public void setLastFolder(Path folder) {
        store.put("lastFolder", folder.toAbsolutePath().toString());
    }
}
