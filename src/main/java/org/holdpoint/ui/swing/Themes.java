package org.holdpoint.ui.swing;

import com.formdev.flatlaf.FlatDarkLaf;
import com.formdev.flatlaf.FlatLaf;
import com.formdev.flatlaf.FlatLightLaf;
import javax.swing.UIManager;
import org.holdpoint.ui.model.PreferenceStore;

/** The light and dark looks (FlatLaf), remembered between runs. */
enum Themes {
    /** Light. */
    LIGHT("Light"),
    /** Dark. */
    DARK("Dark");

    private final String title;

    Themes(String title) {
        this.title = title;
    }

    /** @return the menu title */
    String title() {
        return title;
    }

    /** @return whether this is the dark look */
    boolean dark() {
        return this == DARK;
    }

    /**
     * Installs this look (event thread, or before any window exists).
     *
     * @return whether FlatLaf could be installed (else the system look is kept)
     */
    boolean install() {
        UIManager.put("Table.showHorizontalLines", true);
        UIManager.put("Table.intercellSpacing", new java.awt.Dimension(0, 1));
        UIManager.put("Component.focusWidth", 1);
        UIManager.put("ScrollBar.showButtons", false);
        UIManager.put("TabbedPane.showTabSeparators", true);
        boolean ok = this == DARK ? FlatDarkLaf.setup() : FlatLightLaf.setup();
        if (!ok) {
            try {
                UIManager.setLookAndFeel(UIManager.getSystemLookAndFeelClassName());
            } catch (ReflectiveOperationException | javax.swing.UnsupportedLookAndFeelException e) {
                return false;
            }
        }
        return ok;
    }

    /** Switches every open window to this look (event thread). */
    void apply() {
        install();
        FlatLaf.updateUI();
    }

    /** @return whether the installed look is a dark one (FlatLaf says so of its dark themes) */
    static boolean isDark() {
        return FlatLaf.isLafDark();
    }

    /**
     * @param store the preferences
     * @return the remembered look, light by default
     */
    static Themes remembered(PreferenceStore store) {
        return "DARK".equals(store.get("theme")) ? DARK : LIGHT;
    }

    /** @param store where to remember the choice */
    void remember(PreferenceStore store) {
        store.put("theme", name());
    }
}
