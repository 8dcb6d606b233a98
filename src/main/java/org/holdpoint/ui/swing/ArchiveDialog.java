package org.holdpoint.ui.swing;

import java.awt.BorderLayout;
import java.awt.Dimension;
import java.awt.FlowLayout;
import java.awt.GridBagConstraints;
import java.awt.GridBagLayout;
import java.awt.Insets;
import java.awt.event.MouseAdapter;
import java.awt.event.MouseEvent;
import java.util.EnumMap;
import java.util.Map;
import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JCheckBox;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import javax.swing.JDialog;
import javax.swing.JFrame;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JSplitPane;
import javax.swing.JTable;
import javax.swing.JTextArea;
import javax.swing.JTextField;
import javax.swing.ListSelectionModel;
import javax.swing.table.AbstractTableModel;
import org.holdpoint.chart.ChartTheme;
import org.holdpoint.study.ArchiveQuery;
import org.holdpoint.study.ChangeKind;
import org.holdpoint.ui.model.ArchiveBrowser;
import org.holdpoint.ui.model.ArchiveBrowser.Field;
import org.holdpoint.ui.model.ResultColumn;
import org.holdpoint.ui.model.ResultsTable;
import org.holdpoint.ui.model.StudySession;

/**
 * The archive view: filters on top, the versions found in the middle, the version opened read-only
 * (its record, audit trail and results re-computed from its raw data) below, and the verification.
 */
final class ArchiveDialog extends JDialog {
    private static final long serialVersionUID = 1L;
    private final transient StudySession session;
    private final transient ArchiveBrowser browser;
    private final Map<Field, JComponent> fields = new EnumMap<>(Field.class);
    private final Map<Field, JLabel> problems = new EnumMap<>(Field.class);
    private final JCheckBox currentOnly = new JCheckBox("Current versions only");
    private final JButton search = new JButton("Search");
    private final JButton open = new JButton("Open read-only");
    private final JButton verify = new JButton("Verify archive");
    private final Rows rows = new Rows();
    private final JTable table = new JTable(rows);
    private final JTextArea openedBanner = new JTextArea(2, 60);
    private final JTextArea openedText = new JTextArea();
    private final OpenedResults openedResults = new OpenedResults();
    private final JTextArea verification = new JTextArea(2, 60);

    ArchiveDialog(JFrame owner, StudySession session) {
        super(owner, "Change-record archive", false);
        this.session = session;
        this.browser = session.archive();
        createComponents();
        layoutComponents();
        refreshFilters();
        setSize(new Dimension(Math.min(1360, owner.getWidth()), Math.min(860, owner.getHeight())));
        setLocationRelativeTo(owner);
    }

    private void createComponents() {
        for (Field f : Field.values()) {
            JComponent c;
            if (f == Field.KIND || f == Field.VERDICT) {
                String[] items = f == Field.KIND ? java.util.stream.Stream.concat(java.util.stream.Stream.of("any"),
                        java.util.Arrays.stream(ChangeKind.values()).map(ChangeKind::words)).toArray(String[]::new)
                        : new String[] {"any", "verified", "not verified"};
                JComboBox<String> box = new JComboBox<>(items);
                box.addActionListener(e -> {
                    String v = (String) box.getSelectedItem();
                    browser.set(f, "any".equals(v) ? "" : v);
                });
                browser.addListener(ArchiveBrowser.Property.FILTERS, e -> {
                    String v = browser.get(f).isEmpty() ? "any" : browser.get(f);
                    if (!v.equals(box.getSelectedItem())) {
                        box.setSelectedItem(v);
                    }
                });
                c = box;
            } else {
                JTextField t = new JTextField(f == Field.URL ? 40 : 14);
                Runnable refresh = Bind.text(t, () -> browser.get(f), v -> browser.set(f, v));
                browser.addListener(ArchiveBrowser.Property.FILTERS, e -> refresh.run());
                t.addActionListener(e -> browser.search());
                c = t;
            }
            c.setName("archive." + f.name());
            fields.put(f, c);
            JLabel p = Bind.errorLabel();
            problems.put(f, p);
        }
        ((JTextField) fields.get(Field.URL)).putClientProperty("JTextField.placeholderText",
                "empty = the archive on this computer (or the one in the settings file)");
        ((JTextField) fields.get(Field.FROM)).putClientProperty("JTextField.placeholderText", "yyyy-mm-dd");
        ((JTextField) fields.get(Field.TO)).putClientProperty("JTextField.placeholderText", "yyyy-mm-dd");
        currentOnly.addActionListener(e -> browser.setVersions(currentOnly.isSelected()
                ? ArchiveQuery.Versions.CURRENT : ArchiveQuery.Versions.ALL));
        search.setName("archive.search");
        search.setMnemonic('S');
        search.addActionListener(e -> browser.search());
        open.setName("archive.open");
        open.setMnemonic('O');
        open.addActionListener(e -> openSelected());
        verify.setName("archive.verify");
        verify.setMnemonic('V');
        verify.addActionListener(e -> browser.verify());
        table.setName("archive.rows");
        table.setSelectionMode(ListSelectionModel.SINGLE_SELECTION);
        table.setFillsViewportHeight(true);
        table.addMouseListener(new MouseAdapter() {
            @Override
            public void mouseClicked(MouseEvent e) {
                if (e.getClickCount() == 2) {
                    openSelected();
                }
            }
        });
        table.getSelectionModel().addListSelectionListener(e -> refreshEnabled());
        int[] widths = {50, 150, 120, 330, 90, 110, 160, 140, 130};
        for (int i = 0; i < widths.length; i++) {
            table.getColumnModel().getColumn(i).setPreferredWidth(widths[i]);
        }
        openedBanner.setName("archive.readOnly");
        openedBanner.setFont(openedBanner.getFont().deriveFont(java.awt.Font.BOLD));
        openedBanner.setEditable(false);
        openedBanner.setFocusable(false);
        openedBanner.setLineWrap(true);
        openedBanner.setWrapStyleWord(true);
        openedBanner.setBackground(new java.awt.Color(0xFF, 0xF4, 0xD6));
        openedBanner.setForeground(new java.awt.Color(0x5A, 0x3E, 0x00));
        openedBanner.setBorder(BorderFactory.createCompoundBorder(BorderFactory.createLineBorder(
                new java.awt.Color(0xE0, 0xB8, 0x4A)), BorderFactory.createEmptyBorder(6, 10, 6, 10)));
        openedText.setEditable(false);
        openedText.setLineWrap(true);
        openedText.setWrapStyleWord(true);
        openedText.setName("archive.opened");
        verification.setEditable(false);
        verification.setLineWrap(true);
        verification.setWrapStyleWord(true);
        verification.setOpaque(false);
        verification.setName("archive.verification");
        browser.addListener(ArchiveBrowser.Property.FILTERS, e -> refreshFilters());
        browser.addListener(ArchiveBrowser.Property.ROWS, e -> {
            rows.fireTableDataChanged();
            refreshEnabled();
        });
        browser.addListener(ArchiveBrowser.Property.OPENED, e -> refreshOpened());
        browser.addListener(ArchiveBrowser.Property.VERIFIED, e -> refreshVerified());
        session.addListener(StudySession.Property.BUSY, e -> refreshEnabled());
    }

    private void layoutComponents() {
        JPanel filters = new JPanel(new GridBagLayout());
        filters.setBorder(BorderFactory.createEmptyBorder(12, 16, 4, 16));
        GridBagConstraints c = new GridBagConstraints();
        c.anchor = GridBagConstraints.LINE_START;
        c.insets = new Insets(3, 0, 3, 8);
        c.gridy = 0;
        c.gridx = 0;
        filters.add(new JLabel(Field.URL.label()), c);
        c.gridx = 1;
        c.gridwidth = 5;
        c.fill = GridBagConstraints.HORIZONTAL;
        filters.add(fields.get(Field.URL), c);
        c.gridx = 6;
        c.gridwidth = 3;
        c.fill = GridBagConstraints.NONE;
        filters.add(problems.get(Field.URL), c);
        c.gridwidth = 1;
        Field[][] grid = {{Field.PART, Field.CHARACTERISTIC, Field.SIGNER}, {Field.KIND, Field.VERDICT},
            {Field.FROM, Field.TO}};
        for (Field[] line : grid) {
            c.gridy++;
            int x = 0;
            for (Field f : line) {
                c.gridx = x++;
                c.fill = GridBagConstraints.NONE;
                filters.add(new JLabel(f.label()), c);
                c.gridx = x++;
                c.fill = GridBagConstraints.HORIZONTAL;
                filters.add(fields.get(f), c);
                c.gridx = x++;
                c.fill = GridBagConstraints.NONE;
                filters.add(problems.get(f), c);
            }
        }
        c.gridy++;
        c.gridx = 0;
        c.gridwidth = 9;
        JPanel buttons = new JPanel(new FlowLayout(FlowLayout.LEFT, 0, 0));
        buttons.add(currentOnly);
        buttons.add(javax.swing.Box.createHorizontalStrut(16));
        buttons.add(search);
        buttons.add(javax.swing.Box.createHorizontalStrut(8));
        buttons.add(open);
        buttons.add(javax.swing.Box.createHorizontalStrut(8));
        buttons.add(verify);
        filters.add(buttons, c);
        c.gridy++;
        filters.add(verification, c);
        c.gridx = 9;
        c.gridwidth = 1;
        c.weightx = 1;
        filters.add(javax.swing.Box.createHorizontalGlue(), c);
        JPanel detail = new JPanel(new BorderLayout(0, 6));
        detail.setBorder(BorderFactory.createEmptyBorder(6, 16, 12, 16));
        detail.add(openedBanner, BorderLayout.NORTH);
        JTable results = new JTable(openedResults);
        results.setName("archive.results");
        results.setFillsViewportHeight(true);
        results.setDefaultRenderer(org.holdpoint.ui.model.VerdictLook.class, new ResultsPanel.VerdictRenderer());
        results.setDefaultRenderer(Double.class, new ResultsPanel.NumberRenderer());
        results.setAutoResizeMode(JTable.AUTO_RESIZE_OFF);
        int[] widths = {120, 150, 170, 45, 110, 190, 130, 70};
        for (int i = 0; i < widths.length; i++) {
            results.getColumnModel().getColumn(i).setPreferredWidth(widths[i]);
        }
        JSplitPane inner = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, new JScrollPane(openedText),
                new JScrollPane(results));
        inner.setResizeWeight(0.5);
        inner.setBorder(null);
        detail.add(inner, BorderLayout.CENTER);
        JPanel list = new JPanel(new BorderLayout());
        list.setBorder(BorderFactory.createEmptyBorder(4, 16, 4, 16));
        list.add(new JScrollPane(table), BorderLayout.CENTER);
        JSplitPane split = new JSplitPane(JSplitPane.VERTICAL_SPLIT, list, detail);
        split.setResizeWeight(0.4);
        split.setBorder(null);
        JPanel root = new JPanel(new BorderLayout());
        root.add(filters, BorderLayout.NORTH);
        root.add(split, BorderLayout.CENTER);
        setContentPane(root);
        getRootPane().setDefaultButton(search);
        // Escape closes the archive view, as it closes any dialog
        getRootPane().registerKeyboardAction(e -> setVisible(false), javax.swing.KeyStroke.getKeyStroke("ESCAPE"),
                javax.swing.JComponent.WHEN_IN_FOCUSED_WINDOW);
        refreshOpened();
    }

    /** Selects a row of the versions found (event thread; the screenshot tour). */
    void selectRow(int row) {
        table.setRowSelectionInterval(row, row);
    }

    private void openSelected() {
        int r = table.getSelectedRow();
        if (r >= 0) {
            browser.open(table.convertRowIndexToModel(r));
        }
    }

    private void refreshFilters() {
        for (Field f : Field.values()) {
            String p = browser.problem(f);
            problems.get(f).setText(p == null ? " " : "⚠ " + p);
            fields.get(f).putClientProperty("JComponent.outline", p == null ? null : "error");
        }
    }

    private void refreshEnabled() {
        boolean idle = !session.busy();
        search.setEnabled(idle);
        verify.setEnabled(idle);
        open.setEnabled(idle && table.getSelectedRow() >= 0);
    }

    private void refreshOpened() {
        var lines = browser.openedLines();
        if (lines.isEmpty()) {
            openedBanner.setText("Select a version and press Open read-only (or double-click it).");
            openedBanner.setOpaque(false);
            openedText.setText("");
        } else {
            openedBanner.setText(lines.get(0));
            openedBanner.setOpaque(true);
            openedText.setText(String.join("\n", lines.subList(1, lines.size())));
            openedText.setCaretPosition(0);
        }
        openedResults.fireTableDataChanged();
    }

    private void refreshVerified() {
        var r = browser.verified();
        verification.setText(String.join("\n", browser.verifiedLines()));
        verification.setForeground(r != null && !r.intact() ? Bind.errorColour()
                : javax.swing.UIManager.getColor("Label.foreground"));
    }

    /** The versions found. */
    private final class Rows extends AbstractTableModel {
        private static final long serialVersionUID = 1L;

        @Override
        public int getRowCount() {
            return browser.rows().size();
        }

        @Override
        public int getColumnCount() {
            return ArchiveBrowser.Column.values().length;
        }

        @Override
        public String getColumnName(int c) {
            return ArchiveBrowser.Column.values()[c].label();
        }

        @Override
        public Object getValueAt(int r, int c) {
            return browser.value(r, ArchiveBrowser.Column.values()[c]);
        }
    }

    /** The results of the opened version, re-computed from its raw data; not editable. */
    private final class OpenedResults extends AbstractTableModel {
        private static final long serialVersionUID = 1L;
        private final ResultColumn[] cols = ResultColumn.values();

        private ResultsTable t() {
            return browser.openedResults();
        }

        @Override
        public int getRowCount() {
            return t().rowCount();
        }

        @Override
        public int getColumnCount() {
            return cols.length;
        }

        @Override
        public String getColumnName(int c) {
            return cols[c].label();
        }

        @Override
        public Class<?> getColumnClass(int c) {
            return cols[c].type();
        }

        @Override
        public Object getValueAt(int r, int c) {
            return t().value(r, cols[c]);
        }

        @Override
        public boolean isCellEditable(int r, int c) {
            return false;
        }
    }
}
