package org.holdpoint.ui.swing;

import java.awt.BorderLayout;
import java.awt.CardLayout;
import java.awt.Dimension;
import java.awt.Font;
import java.awt.GraphicsEnvironment;
import java.awt.GridLayout;
import java.awt.Rectangle;
import java.awt.Toolkit;
import java.awt.event.KeyEvent;
import java.awt.event.WindowAdapter;
import java.awt.event.WindowEvent;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.util.EnumMap;
import java.util.Map;
import javax.swing.AbstractButton;
import javax.swing.BorderFactory;
import javax.swing.ButtonGroup;
import javax.swing.JComponent;
import javax.swing.JFrame;
import javax.swing.JLabel;
import javax.swing.JMenu;
import javax.swing.JMenuBar;
import javax.swing.JMenuItem;
import javax.swing.JOptionPane;
import javax.swing.JPanel;
import javax.swing.JRadioButtonMenuItem;
import javax.swing.JTextArea;
import javax.swing.JTextField;
import javax.swing.JToggleButton;
import javax.swing.KeyStroke;
import javax.swing.SwingUtilities;
import javax.swing.WindowConstants;
import org.holdpoint.study.Cautions;
import org.holdpoint.ui.model.PreferenceStore;
import org.holdpoint.ui.model.RecentFiles;
import org.holdpoint.ui.model.Step;
import org.holdpoint.ui.model.StudySession;
import org.holdpoint.ui.model.UserMessage;
import org.holdpoint.workflow.StudyService;
import org.holdpoint.workflow.Version;

/**
 * The Holdpoint window: the six steps of a change study on the left, the step in the middle, the
 * overall verdict always on top and the cautions always at the bottom. Opens on the bundled demo
 * study, analysed. Built and used on the event thread only.
 */
public final class MainWindow extends JFrame {
    private static final long serialVersionUID = 1L;
    private final transient StudySession session;
    private final transient PreferenceStore prefs;
    private final transient Dialogs dialogs;
    private final CardLayout cards = new CardLayout();
    private final JPanel center = new JPanel(cards);
    private final Map<Step, JToggleButton> stepButtons = new EnumMap<>(Step.class);
    private final ProgressStrip progress = new ProgressStrip();
    private final JLabel status = new JLabel(" ");
    private final JLabel banner = new JLabel(" ");
    private final JLabel bannerCounts = new JLabel(" ");
    private final JMenu recentMenu = new JMenu("Recent files");
    private ResultsPanel resultsPanel;
    private DataPanel dataPanel;
    private CriteriaPanel criteriaPanel;
    private ChangePanel changePanel;
    private PlanPanel planPanel;
    private Step current = Step.CHANGE;
    private ArchiveDialog archiveDialog;

    /**
     * Creates the window (event thread).
     *
     * @param prefs    where recent files, last folder and theme are kept
     * @param archives how the window reaches the change-record archive (from the composition root)
     */
    public MainWindow(PreferenceStore prefs, org.holdpoint.workflow.ArchiveAccess archives) {
        super("Holdpoint");
        this.prefs = prefs;
        RecentFiles recent = new RecentFiles(prefs);
        this.session = new StudySession(new StudyService(archives), new SwingTaskRunner(progress), recent,
                Clock.systemDefaultZone());
        this.dialogs = new Dialogs(this, recent);
        createComponents();
        layoutComponents();
        bindSession();
        setDefaultCloseOperation(WindowConstants.DO_NOTHING_ON_CLOSE);
        addWindowListener(new WindowAdapter() {
            @Override
            public void windowClosing(WindowEvent e) {
                closeWindow();
            }
        });
        sizeWindow();
        show(Step.RESULTS);
    }

    /**
     * Opens the window on the event thread with the remembered theme, and loads the demo study.
     * Called on any thread; returns at once.
     *
     * @param archives how the window reaches the change-record archive (from the composition root)
     * @throws IllegalStateException when there is no display
     */
    public static void launch(org.holdpoint.workflow.ArchiveAccess archives) {
        if (GraphicsEnvironment.isHeadless()) {
            throw new IllegalStateException("no display is available for the window; run a command instead "
                    + "(holdpoint --help)");
        }
        SwingUtilities.invokeLater(() -> {
            // a fault on the event thread is shown as one and written in full to the fault log
            Thread.setDefaultUncaughtExceptionHandler((t, e) -> {
                java.nio.file.Path log = org.holdpoint.ui.model.FaultLog.write("uncaught on " + t.getName(), e);
                SwingUtilities.invokeLater(() -> JOptionPane.showMessageDialog(null, "<html><body style='width: "
                        + "420px'><b>Holdpoint met a fault of its own (" + Dialogs.esc(e.getClass().getSimpleName())
                        + ").</b><br><br>Save your work under a new name. The details are in " + (log == null
                        ? "the standard error output" : Dialogs.esc(log.toString())) + "; please send them with a "
                        + "report.</body></html>", "Internal error", JOptionPane.ERROR_MESSAGE));
            });
            PreferenceStore prefs = safePrefs();
            Themes.remembered(prefs).install();
            MainWindow w = new MainWindow(prefs, archives);
            w.setVisible(true);
            w.session().openDemo();
        });
    }

    private static PreferenceStore safePrefs() {
        try {
            PreferenceStore p = PreferenceStore.user();
            p.get("theme");
            return p;
        } catch (RuntimeException | Error e) {
            // said, not silent: the window works, but nothing chosen in it is remembered
            System.err.println("holdpoint: the user preferences cannot be read (" + e + "); this session's "
                    + "choices (theme, recent files, last folder) will not be remembered");
            return PreferenceStore.inMemory();
        }
    }

    /** @return the window's presentation model */
    public StudySession session() {
        return session;
    }

    private void createComponents() {
        changePanel = new ChangePanel(session.change());
        dataPanel = new DataPanel(session, dialogs);
        criteriaPanel = new CriteriaPanel(session);
        resultsPanel = new ResultsPanel(session);
        SignOffPanel signOff = new SignOffPanel(session, new SignOffPanel.Actions() {
            @Override
            public void save() {
                saveStudy(false, null);
            }

            @Override
            public void writeWorkbook() {
                MainWindow.this.writeWorkbook();
            }

            @Override
            public String workbookUnavailable() {
                return null;
            }

            @Override
            public void saveToArchive() {
                MainWindow.this.saveToArchive();
            }
        });
        center.add(changePanel, Step.CHANGE.name());
        center.add(dataPanel, Step.DATA.name());
        center.add(criteriaPanel, Step.CRITERIA.name());
        center.add(resultsPanel, Step.RESULTS.name());
        planPanel = new PlanPanel(session);
        center.add(planPanel, Step.PLAN.name());
        center.add(signOff, Step.SIGN_OFF.name());
        ButtonGroup g = new ButtonGroup();
        for (Step s : Step.values()) {
            JToggleButton b = new JToggleButton("<html><b>" + (s.ordinal() + 1) + "  " + s.title()
                    + "</b><br><span style='font-size:90%'>" + s.hint() + "</span></html>");
            b.setHorizontalAlignment(AbstractButton.LEFT);
            b.setMnemonic(s.mnemonic());
            b.setDisplayedMnemonicIndex(-1);
            b.setToolTipText(s.title() + " (Alt+" + s.mnemonic() + " or Ctrl+" + (s.ordinal() + 1) + ")");
            b.setName("step." + s.name());
            b.putClientProperty("JButton.buttonType", "borderless");
            b.setFocusable(true);
            b.addActionListener(e -> show(s));
            g.add(b);
            stepButtons.put(s, b);
        }
        banner.setName("verdict");
        banner.setFont(banner.getFont().deriveFont(Font.BOLD, banner.getFont().getSize2D() * 1.25f));
        status.setName("status");
        setJMenuBar(menus());
    }

    private void layoutComponents() {
        JPanel root = new JPanel(new BorderLayout());
        JPanel top = new JPanel(new BorderLayout(12, 2));
        top.setBorder(BorderFactory.createCompoundBorder(new EdgeBorder(0, 0, 1, 0),
                BorderFactory.createEmptyBorder(10, 16, 10, 16)));
        JPanel texts = new JPanel(new GridLayout(2, 1));
        texts.setOpaque(false);
        texts.add(banner);
        texts.add(bannerCounts);
        top.add(texts, BorderLayout.CENTER);
        root.add(top, BorderLayout.NORTH);
        JPanel steps = new JPanel(new GridLayout(0, 1, 0, 6));
        steps.setBorder(BorderFactory.createEmptyBorder(16, 12, 16, 12));
        for (Step s : Step.values()) {
            steps.add(stepButtons.get(s));
        }
        JPanel west = new JPanel(new BorderLayout());
        west.add(steps, BorderLayout.NORTH);
        west.setBorder(new EdgeBorder(0, 0, 0, 1));
        root.add(west, BorderLayout.WEST);
        root.add(center, BorderLayout.CENTER);
        JPanel south = new JPanel(new BorderLayout());
        south.add(progress, BorderLayout.NORTH);
        // the first caution is always in view; the others open with one press (and are in full on the Sign-off
        // step and under Help), so that a small screen keeps its room for the results
        String first = "Cautions: " + Cautions.TEXT.get(0);
        String all = "Cautions: " + String.join(" ", Cautions.TEXT);
        JTextArea cautions = new JTextArea(first);
        cautions.setName("cautions");
        cautions.setEditable(false);
        cautions.setFocusable(false);
        cautions.setLineWrap(true);
        cautions.setWrapStyleWord(true);
        cautions.setOpaque(false);
        cautions.putClientProperty("FlatLaf.styleClass", "small");
        cautions.setBorder(BorderFactory.createEmptyBorder(6, 16, 4, 8));
        javax.swing.JToggleButton more = new javax.swing.JToggleButton("All cautions");
        more.setName("cautions.more");
        more.putClientProperty("JButton.buttonType", "borderless");
        more.setToolTipText("Show every caution (they apply to every result)");
        more.addActionListener(e -> {
            cautions.setText(more.isSelected() ? all : first);
            more.setText(more.isSelected() ? "Fewer" : "All cautions");
            south.revalidate();
        });
        JPanel cautionRow = new JPanel(new BorderLayout());
        cautionRow.setOpaque(false);
        cautionRow.add(cautions, BorderLayout.CENTER);
        JPanel moreBox = new JPanel(new java.awt.FlowLayout(java.awt.FlowLayout.RIGHT, 8, 2));
        moreBox.setOpaque(false);
        moreBox.add(more);
        cautionRow.add(moreBox, BorderLayout.EAST);
        south.add(cautionRow, BorderLayout.CENTER);
        status.setBorder(BorderFactory.createEmptyBorder(2, 16, 6, 16));
        south.add(status, BorderLayout.SOUTH);
        south.setBorder(new EdgeBorder(1, 0, 0, 0));
        root.add(south, BorderLayout.SOUTH);
        setContentPane(root);
        for (Step s : Step.values()) {
            root.getInputMap(JComponent.WHEN_IN_FOCUSED_WINDOW).put(KeyStroke.getKeyStroke(KeyEvent.VK_1 + s.ordinal(),
                    menuMask()), "step." + s.name());
            root.getActionMap().put("step." + s.name(), action(() -> show(s)));
        }
        root.getInputMap(JComponent.WHEN_IN_FOCUSED_WINDOW).put(KeyStroke.getKeyStroke("ESCAPE"), "cancel");
        root.getActionMap().put("cancel", action(() -> {
            if (progress.isVisible() && progress.cancelButton().isEnabled()) {
                progress.cancelButton().doClick();
            }
        }));
    }

    private void bindSession() {
        session.addListener(StudySession.Property.PROBLEM, e -> {
            if (e.getNewValue() instanceof UserMessage m) {
                status.setText("⚠ " + m.title());
                dialogs.tell(m);
            }
        });
        session.addListener(StudySession.Property.STATUS, e -> status.setText(session.lastStatus()));
        session.addListener(StudySession.Property.STEP, e -> show((Step) e.getNewValue()));
        session.addListener(StudySession.Property.DIRTY, e -> refreshTitle());
        session.addListener(StudySession.Property.STUDY_FILE, e -> refreshTitle());
        session.addListener(StudySession.Property.BUSY, e -> setCursor(session.busy()
                ? java.awt.Cursor.getPredefinedCursor(java.awt.Cursor.WAIT_CURSOR) : null));
        session.results().addListener(org.holdpoint.ui.model.ResultsTable.Property.RESULT, e -> refreshBanner());
        refreshBanner();
        refreshTitle();
    }

    private void refreshBanner() {
        var r = session.results();
        VerdictIcon icon = new VerdictIcon(r.overallLook(), 28);
        banner.setIcon(icon);
        banner.setIconTextGap(12);
        banner.setHorizontalTextPosition(javax.swing.SwingConstants.LEADING);
        banner.setText(r.overallWords());
        bannerCounts.setText(r.counts().isEmpty() ? " " : r.staleBecause() != null ? "      The results on screen "
                + "are those of the last analysis (" + r.counts() + "); they cannot be written or signed."
                : "      " + r.counts() + ".  The change is verified only when every characteristic passes.");
    }

    private void refreshTitle() {
        Path f = session.studyFile();
        setTitle((session.dirty() ? "• " : "") + (f == null ? "unsaved study" : f.getFileName().toString())
                + " — Holdpoint " + Version.get());
    }

    /**
     * Shows a step (event thread).
     *
     * @param s the step
     */
    public void show(Step s) {
        current = s;
        cards.show(center, s.name());
        stepButtons.get(s).setSelected(true);
        JComponent focus = switch (s) {
            case CHANGE -> changePanel.firstField();
            case DATA -> dataPanel.importButton();
            case RESULTS -> resultsPanel.focusTarget();
            case PLAN -> planPanel.focusTarget();
            default -> null;
        };
        if (focus != null) {
            SwingUtilities.invokeLater(focus::requestFocusInWindow);
        }
        if (s == Step.DATA) {
            getRootPane().setDefaultButton(dataPanel.importButton());
        } else {
            getRootPane().setDefaultButton(null);
        }
    }

    /** @return the step shown */
    public Step currentStep() {
        return current;
    }

    private JMenuBar menus() {
        JMenuBar bar = new JMenuBar();
        JMenu file = new JMenu("File");
        file.setMnemonic('F');
        file.add(item("Open data…", 'O', KeyStroke.getKeyStroke(KeyEvent.VK_O, menuMask()), this::openData));
        file.add(item("Open study file…", 'S', KeyStroke.getKeyStroke(KeyEvent.VK_O, menuMask()
                | KeyEvent.SHIFT_DOWN_MASK), this::openStudy));
        file.add(item("Open the demo study", 'D', null, this::openDemo));
        recentMenu.setMnemonic('R');
        file.add(recentMenu);
        file.addMenuListener(new javax.swing.event.MenuListener() {
            @Override
            public void menuSelected(javax.swing.event.MenuEvent e) {
                fillRecent();
            }

            @Override
            public void menuDeselected(javax.swing.event.MenuEvent e) {
            }

            @Override
            public void menuCanceled(javax.swing.event.MenuEvent e) {
            }
        });
        file.addSeparator();
        file.add(item("Save study", 'V', KeyStroke.getKeyStroke(KeyEvent.VK_S, menuMask()),
                () -> saveStudy(false, null)));
        file.add(item("Save study as…", 'A', KeyStroke.getKeyStroke(KeyEvent.VK_S, menuMask()
                | KeyEvent.SHIFT_DOWN_MASK), () -> saveStudy(true, null)));
        file.addSeparator();
        file.add(item("Change-record archive…", 'H', KeyStroke.getKeyStroke(KeyEvent.VK_R, menuMask()
                | KeyEvent.SHIFT_DOWN_MASK), this::showArchive));
        file.add(item("Save to the archive…", 'T', null, this::saveToArchive));
        file.addSeparator();
        file.add(item("Close", 'C', KeyStroke.getKeyStroke(KeyEvent.VK_Q, menuMask()), this::closeWindow));
        bar.add(file);
        JMenu study = new JMenu("Study");
        study.setMnemonic('S');
        study.add(item("Analyse again", 'A', KeyStroke.getKeyStroke(KeyEvent.VK_F5, 0), session::analyse));
        for (Step s : Step.values()) {
            study.add(item("Go to " + s.title(), Character.forDigit(s.ordinal() + 1, 10),
                    KeyStroke.getKeyStroke(KeyEvent.VK_1 + s.ordinal(), menuMask()), () -> show(s)));
        }
        bar.add(study);
        JMenu view = new JMenu("View");
        view.setMnemonic('V');
        ButtonGroup themes = new ButtonGroup();
        Themes now = Themes.remembered(prefs);
        for (Themes t : Themes.values()) {
            JRadioButtonMenuItem m = new JRadioButtonMenuItem(t.title() + " theme", t == now);
            m.setMnemonic(t.title().charAt(0));
            m.addActionListener(e -> {
                t.remember(prefs);
                t.apply();
            });
            themes.add(m);
            view.add(m);
        }
        bar.add(view);
        JMenu help = new JMenu("Help");
        help.setMnemonic('H');
        help.add(item("Cautions", 'C', KeyStroke.getKeyStroke(KeyEvent.VK_F1, 0), () -> JOptionPane.showMessageDialog(
                this, "<html><body style='width: 420px'><b>These cautions apply to every result.</b><br><br>"
                        + String.join("<br><br>", Cautions.TEXT) + "</body></html>", "Cautions",
                JOptionPane.INFORMATION_MESSAGE)));
        help.add(item("About Holdpoint", 'A', null, () -> JOptionPane.showMessageDialog(this,
                "<html><b>Holdpoint " + Version.get() + "</b><br>Verifies a manufacturing process change from before "
                        + "and after samples.<br>Difference = after − before.<br><br>"
                        + String.join("<br>", Cautions.TEXT) + "</html>", "About Holdpoint",
                JOptionPane.INFORMATION_MESSAGE)));
        bar.add(help);
        return bar;
    }

    private void fillRecent() {
        recentMenu.removeAll();
        var list = session.recent().list();
        if (list.isEmpty()) {
            JMenuItem none = new JMenuItem("(none yet)");
            none.setEnabled(false);
            recentMenu.add(none);
        }
        int i = 1;
        for (Path p : list) {
            JMenuItem m = new JMenuItem(i + "  " + p.getFileName() + "   (" + p.getParent() + ")");
            if (i < 10) {
                m.setMnemonic(Character.forDigit(i, 10));
            }
            m.addActionListener(e -> openRecent(p));
            recentMenu.add(m);
            i++;
        }
    }

    private void openRecent(Path p) {
        if (!Files.exists(p)) {
            session.problem(new UserMessage("File not found", p + " no longer exists.",
                    "Choose the file again with Open data… or Open study file…."));
            return;
        }
        if (p.getFileName().toString().endsWith(Dialogs.STUDY_SUFFIX)) {
            if (confirmDiscard()) {
                session.openStudy(p);
            }
        } else {
            session.dataForm().setSource(org.holdpoint.ui.model.DataForm.Source.ONE_FILE);
            session.dataForm().setFile(p);
            show(Step.DATA);
        }
    }

    private void openData() {
        show(Step.DATA);
        Path p = dialogs.chooseData("Open the data file");
        if (p != null) {
            session.dataForm().setSource(org.holdpoint.ui.model.DataForm.Source.ONE_FILE);
            session.dataForm().setFile(p);
            session.importAndAnalyse();
        }
    }

    private void openStudy() {
        if (!confirmDiscard()) {
            return;
        }
        Path p = dialogs.chooseStudy();
        if (p != null) {
            session.openStudy(p);
        }
    }

    private void openDemo() {
        if (confirmDiscard()) {
            session.openDemo();
        }
    }

    private void saveStudy(boolean askWhere, Runnable then) {
        Path target = session.studyFile();
        if (askWhere || target == null) {
            String id = session.change().toDescription().id().replaceAll("[^A-Za-z0-9._-]+", "-");
            target = dialogs.chooseSave("Save the study file", id + Dialogs.STUDY_SUFFIX, Dialogs.STUDY_SUFFIX);
        }
        if (target != null) {
            session.save(target, then);
        }
    }

    /** Shows the archive view (event thread). */
    void showArchive() {
        if (archiveDialog == null) {
            archiveDialog = new ArchiveDialog(this, session);
        }
        archiveDialog.setVisible(true);
        archiveDialog.toFront();
    }

    /** @return the archive view, or null before it was first shown */
    ArchiveDialog archiveDialog() {
        return archiveDialog;
    }

    private void saveToArchive() {
        var signed = session.signOff().signatures();
        JTextField actor = new JTextField(signed.isEmpty() ? "" : signed.get(signed.size() - 1).name(), 28);
        JTextField reason = new JTextField(28);
        JPanel p = new JPanel(new GridLayout(0, 1, 0, 4));
        p.add(new JLabel("Archived by (printed name)"));
        p.add(actor);
        p.add(new JLabel("Reason (required when this change is already archived: it becomes a correction)"));
        p.add(reason);
        String url = session.archive().get(org.holdpoint.ui.model.ArchiveBrowser.Field.URL).trim();
        p.add(new JLabel("Archive: " + (url.isEmpty() ? "the archive on this computer" : url)
                + " (change it in File › Change-record archive…)"));
        int a = JOptionPane.showConfirmDialog(this, p, "Save to the archive", JOptionPane.OK_CANCEL_OPTION,
                JOptionPane.PLAIN_MESSAGE);
        if (a == JOptionPane.OK_OPTION) {
            session.archive().save(actor.getText(), reason.getText());
        }
    }

    private void writeWorkbook() {
        String id = session.change().toDescription().id().replaceAll("[^A-Za-z0-9._-]+", "-");
        Path target = dialogs.chooseSave("Write the sign-off workbook", id + "-sign-off.xlsx", ".xlsx");
        if (target != null) {
            session.writeWorkbook(target);
        }
    }

    /** @return true when there is no unsaved work, or the user chose to discard it */
    private boolean confirmDiscard() {
        if (!session.dirty()) {
            return true;
        }
        // the safe answer is the default: Enter keeps the work
        Object[] options = {"Keep my work", "Discard the changes"};
        int a = JOptionPane.showOptionDialog(this, "The current study has changes that are not saved in a study "
                + "file. Discard them?", "Unsaved work", JOptionPane.YES_NO_OPTION, JOptionPane.WARNING_MESSAGE, null,
                options, options[0]);
        return a == 1;
    }

    /** Closes the window, asking first when there is unsaved work (event thread). */
    void closeWindow() {
        if (session.busy()) {
            int a = JOptionPane.showConfirmDialog(this, "A task is still running. Stop it and close?", "Close Holdpoint",
                    JOptionPane.YES_NO_OPTION);
            if (a != JOptionPane.YES_OPTION) {
                return;
            }
            progress.cancelButton().doClick();
        }
        if (session.dirty()) {
            Object[] options = {"Save…", "Close without saving", "Cancel"};
            int a = JOptionPane.showOptionDialog(this, "The study has changes that are not saved in a study file.",
                    "Unsaved work", JOptionPane.YES_NO_CANCEL_OPTION, JOptionPane.WARNING_MESSAGE, null, options,
                    options[0]);
            if (a == 0) {
                saveStudy(false, this::dispose);
                return;
            }
            if (a != 1) {
                return;
            }
        }
        dispose();
    }

    private void sizeWindow() {
        Rectangle screen = GraphicsEnvironment.getLocalGraphicsEnvironment().getMaximumWindowBounds();
        int w = Math.min(1440, (int) (screen.width * 0.9));
        int h = Math.min(900, (int) (screen.height * 0.9));
        setMinimumSize(new Dimension(Math.min(1000, w), Math.min(640, h)));
        setSize(w, h);
        setLocationRelativeTo(null);
    }

    private static int menuMask() {
        return Toolkit.getDefaultToolkit().getMenuShortcutKeyMaskEx();
    }

    private static JMenuItem item(String text, char mnemonic, KeyStroke key, Runnable r) {
        JMenuItem m = new JMenuItem(text);
        m.setMnemonic(mnemonic);
        if (key != null) {
            m.setAccelerator(key);
        }
        m.addActionListener(e -> r.run());
        return m;
    }

    private static javax.swing.Action action(Runnable r) {
        return new javax.swing.AbstractAction() {
            private static final long serialVersionUID = 1L;

            @Override
            public void actionPerformed(java.awt.event.ActionEvent e) {
                r.run();
            }
        };
    }
}
