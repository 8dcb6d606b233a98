package org.holdpoint.ui.swing;

import java.awt.BorderLayout;
import java.awt.Color;
import java.awt.Component;
import java.awt.FlowLayout;
import javax.swing.BorderFactory;
import javax.swing.DefaultCellEditor;
import javax.swing.JButton;
import javax.swing.JCheckBox;
import org.holdpoint.stats.ControlChart;
import org.holdpoint.study.StabilityOptions;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTable;
import javax.swing.JTextField;
import javax.swing.ListSelectionModel;
import javax.swing.UIManager;
import javax.swing.table.AbstractTableModel;
import javax.swing.table.DefaultTableCellRenderer;
import org.holdpoint.ui.model.CriteriaColumn;
import org.holdpoint.ui.model.CriteriaTable;
import org.holdpoint.ui.model.StudySession;

/** The Criteria step: one row per characteristic, validated as typed, with the reason beside a bad cell. */
final class CriteriaPanel extends JPanel {
    private static final long serialVersionUID = 1L;
    private static final String WELCH = "Welch (variances may differ)";
    private static final String POOLED = "pooled (equal variances asserted)";
    private final transient StudySession session;
    private final transient CriteriaTable table;
    private final Model model = new Model();
    private final JTable grid = new JTable(model) {
        private static final long serialVersionUID = 1L;

        /** Typing into a selected cell replaces its text, as in a spreadsheet (a double-click edits it). */
        @Override
        public boolean editCellAt(int row, int column, java.util.EventObject e) {
            boolean editing = super.editCellAt(row, column, e);
            if (editing && e instanceof java.awt.event.KeyEvent
                    && getEditorComponent() instanceof javax.swing.text.JTextComponent t) {
                t.selectAll();
            }
            return editing;
        }
    };
    private final JTextField alpha = new JTextField(6);
    private final JLabel alphaProblem = new JLabel(" ");
    private final JComboBox<String> variance = new JComboBox<>(new String[] {WELCH, POOLED});
    private final JCheckBox holm = new JCheckBox("Holm-adjust difference p-values");
    private final JCheckBox rowOrder = new JCheckBox("Rows are in run order");
    private final JComboBox<String> controlTests = new JComboBox<>(new String[] {TESTS_1_3, TESTS_ALL});
    private final JButton fillDown = new JButton("Fill down");
    private final JComboBox<String> copySource = new JComboBox<>();
    private final JButton copy = new JButton("Copy to selected");
    private final JButton analyse = new JButton("Analyse");
    private final JLabel summary = new JLabel(" ");

    private static final String TESTS_1_3 = "tests 1\u20133";
    private static final String TESTS_ALL = "all tests 1\u20138";

    CriteriaPanel(StudySession session) {
        super(new BorderLayout());
        this.session = session;
        this.table = session.criteria();
        createComponents();
        layoutComponents();
        refresh();
    }

    private void createComponents() {
        grid.setName("criteria");
        grid.setRowHeight(Math.max(grid.getRowHeight(), 26));
        grid.setSelectionMode(ListSelectionModel.MULTIPLE_INTERVAL_SELECTION);
        grid.setCellSelectionEnabled(true);
        grid.putClientProperty("terminateEditOnFocusLost", Boolean.TRUE);
        grid.setSurrendersFocusOnKeystroke(true);
        grid.setDefaultRenderer(Object.class, new CheckedRenderer());
        for (CriteriaColumn c : CriteriaColumn.values()) {
            if (c.choices() != null) {
                grid.getColumnModel().getColumn(c.ordinal()).setCellEditor(new DefaultCellEditor(
                        new JComboBox<>(c.choices().toArray(String[]::new))));
            }
        }
        // shares of the width at 1280 pixels; the whole reason of a problem is above the table and in the tip
        int[] widths = {135, 30, 34, 48, 54, 50, 90, 72, 68, 70, 58, 70, 96, 62, 40};
        for (int i = 0; i < widths.length; i++) {
            grid.getColumnModel().getColumn(i).setPreferredWidth(widths[i]);
        }
        grid.setAutoResizeMode(JTable.AUTO_RESIZE_ALL_COLUMNS);
        grid.getSelectionModel().addListSelectionListener(e -> refreshSummary());
        Runnable ra = Bind.text(alpha, table::alpha, table::setAlpha);
        table.addListener(CriteriaTable.Property.ALPHA, e -> {
            ra.run();
            refresh();
        });
        table.addListener(CriteriaTable.Property.ROWS, e -> refresh());
        alpha.setName("alpha");
        variance.setSelectedItem(session.equalVariances() ? POOLED : WELCH);
        variance.addActionListener(e -> session.setEqualVariances(POOLED.equals(variance.getSelectedItem())));
        holm.setMnemonic('H');
        holm.addActionListener(e -> session.setHolm(holm.isSelected()));
        rowOrder.setMnemonic('R');
        rowOrder.setToolTipText("Draw control charts in the order of the file's rows where the data have no sequence "
                + "or date column; tick only when the rows are in the order the parts were made");
        rowOrder.addActionListener(e -> applyStability());
        controlTests.setToolTipText("The ISO 7870-2 tests applied to the control charts");
        controlTests.addActionListener(e -> applyStability());
        session.addListener(StudySession.Property.DATA, e -> {
            variance.setSelectedItem(session.equalVariances() ? POOLED : WELCH);
            holm.setSelected(session.holm());
            rowOrder.setSelected(session.stability().rowOrderIsRunOrder());
            controlTests.setSelectedItem(session.stability().tests().equals(ControlChart.ALL_TESTS) ? TESTS_ALL
                    : TESTS_1_3);
        });
        fillDown.setMnemonic('F');
        fillDown.setToolTipText("Copy the first selected cell of each selected column into the selected rows below "
                + "it (Ctrl+D)");
        fillDown.addActionListener(e -> fillDown());
        grid.getInputMap(JTable.WHEN_ANCESTOR_OF_FOCUSED_COMPONENT).put(javax.swing.KeyStroke.getKeyStroke("ctrl D"),
                "fillDown");
        grid.getActionMap().put("fillDown", new javax.swing.AbstractAction() {
            private static final long serialVersionUID = 1L;

            @Override
            public void actionPerformed(java.awt.event.ActionEvent e) {
                fillDown();
            }
        });
        copy.setMnemonic('O');
        copy.setToolTipText("Copy every criterion of the chosen characteristic into the selected rows");
        copy.addActionListener(e -> copyFrom());
        analyse.setMnemonic('A');
        analyse.setName("analyse");
        analyse.putClientProperty("JButton.buttonType", "default");
        analyse.addActionListener(e -> {
            stopEditing();
            session.analyse();
        });
        session.addListener(StudySession.Property.BUSY, e -> analyse.setEnabled(!session.busy()));
    }

    private void applyStability() {
        // a list other than 1-3 or 1-8 (from the command line or a saved study) is kept until the user picks one
        java.util.SortedSet<Integer> tests = TESTS_ALL.equals(controlTests.getSelectedItem()) ? ControlChart.ALL_TESTS
                : session.stability().tests().equals(ControlChart.ALL_TESTS) ? ControlChart.DEFAULT_TESTS
                : session.stability().tests();
        session.setStability(new StabilityOptions(rowOrder.isSelected(), tests));
    }

    private void layoutComponents() {
        JPanel top = new JPanel(new BorderLayout());
        top.setBorder(BorderFactory.createEmptyBorder(16, 24, 8, 24));
        JPanel titles = new JPanel(new BorderLayout());
        titles.add(Bind.heading("Acceptance criteria per characteristic"), BorderLayout.NORTH);
        titles.add(Bind.hint("Margin: one number d means the equivalence range (−d, d); write L / U for an "
                + "unequal or one-sided range. Margins come from the drawing, the customer or the plan, not from these results."), BorderLayout.SOUTH);
        top.add(titles, BorderLayout.NORTH);
        JPanel study = new JPanel(new FlowLayout(FlowLayout.LEFT, 8, 6));
        study.add(Bind.label("α (each one-sided test)", 'L', alpha));
        study.add(alpha);
        study.add(alphaProblem);
        study.add(Bind.label("Difference test", 'T', variance));
        study.add(variance);
        study.add(holm);
        JPanel charts = new JPanel(new FlowLayout(FlowLayout.LEFT, 8, 2));
        charts.add(Bind.label("Control charts: ISO 7870-2", 'N', controlTests));
        charts.add(controlTests);
        charts.add(rowOrder);
        JPanel options = new JPanel(new BorderLayout());
        options.add(study, BorderLayout.NORTH);
        options.add(charts, BorderLayout.SOUTH);
        top.add(options, BorderLayout.CENTER);
        JPanel tools = new JPanel(new FlowLayout(FlowLayout.LEFT, 8, 0));
        tools.add(fillDown);
        tools.add(Bind.label("Copy from", 'P', copySource));
        tools.add(copySource);
        tools.add(copy);
        tools.add(javax.swing.Box.createHorizontalStrut(24));
        tools.add(analyse);
        JPanel lower = new JPanel(new BorderLayout());
        lower.add(tools, BorderLayout.NORTH);
        summary.setName("criteria.problem");
        summary.setBorder(BorderFactory.createEmptyBorder(6, 8, 0, 0));
        lower.add(summary, BorderLayout.SOUTH);
        top.add(lower, BorderLayout.SOUTH);
        add(top, BorderLayout.NORTH);
        JScrollPane sp = new JScrollPane(grid);
        sp.setBorder(BorderFactory.createCompoundBorder(BorderFactory.createEmptyBorder(0, 24, 16, 24),
                sp.getBorder()));
        add(sp, BorderLayout.CENTER);
    }

    private void refresh() {
        String ap = table.alphaProblem();
        alphaProblem.setText(ap == null ? " " : "⚠ " + ap);
        alpha.putClientProperty("JComponent.outline", ap == null ? null : "error");
        model.fireTableDataChanged();
        Object sel = copySource.getSelectedItem();
        copySource.removeAllItems();
        for (int r = 0; r < table.rowCount(); r++) {
            copySource.addItem(table.name(r));
        }
        if (sel != null) {
            copySource.setSelectedItem(sel);
        }
        refreshSummary();
    }

    /** The reason of the selected row's problem (or the first one) in full, under the toolbar. */
    private void refreshSummary() {
        int bad = table.rowsWithProblems();
        String shown = null;
        int sel = grid.getSelectedRow();
        if (sel >= 0 && sel < table.rowCount() && table.rowProblem(sel) != null) {
            shown = table.name(sel) + " — " + table.rowProblem(sel);
        }
        for (int r = 0; r < table.rowCount() && shown == null; r++) {
            String p = table.rowProblem(r);
            shown = p == null ? null : table.name(r) + " — " + p;
        }
        summary.setForeground(bad == 0 ? UIManager.getColor("Label.foreground") : errorText());
        summary.setText(bad == 0 ? (table.rowCount() == 0 ? "Open data first." : "All criteria are valid.")
                : "⚠ " + bad + " row(s) to correct. " + shown);
    }

    private void stopEditing() {
        if (grid.isEditing()) {
            grid.getCellEditor().stopCellEditing();
        }
    }

    private void fillDown() {
        stopEditing();
        int[] rows = grid.getSelectedRows();
        int[] cols = grid.getSelectedColumns();
        if (rows.length < 2) {
            session.problem(new org.holdpoint.ui.model.UserMessage("Fill down", "Select the cell to copy and the "
                    + "cells below it that should receive it.", ""));
            return;
        }
        for (int c : cols) {
            CriteriaColumn col = CriteriaColumn.values()[grid.convertColumnIndexToModel(c)];
            if (col.editable() && col.ordinal() < CriteriaColumn.values().length) {
                table.fillDown(col, rows[0], java.util.Arrays.copyOfRange(rows, 1, rows.length));
            }
        }
    }

    private void copyFrom() {
        stopEditing();
        int from = copySource.getSelectedIndex();
        int[] rows = grid.getSelectedRows();
        if (from < 0 || rows.length == 0) {
            session.problem(new org.holdpoint.ui.model.UserMessage("Copy criteria", "Choose the characteristic to "
                    + "copy from and select the rows that should receive its criteria.", ""));
            return;
        }
        table.copyFrom(from, rows);
    }

    private static Color errorText() {
        return Bind.errorColour();
    }

    /** The criteria rows, plus a last "Check" column with the row's first problem in words. */
    private final class Model extends AbstractTableModel {
        private static final long serialVersionUID = 1L;

        @Override
        public int getRowCount() {
            return table == null ? 0 : table.rowCount();
        }

        @Override
        public int getColumnCount() {
            return CriteriaColumn.values().length + 1;
        }

        @Override
        public String getColumnName(int c) {
            return c < CriteriaColumn.values().length ? CriteriaColumn.values()[c].label() : "Check";
        }

        @Override
        public boolean isCellEditable(int r, int c) {
            return c < CriteriaColumn.values().length && CriteriaColumn.values()[c].editable();
        }

        @Override
        public Object getValueAt(int r, int c) {
            if (c == CriteriaColumn.values().length) {
                String p = table.rowProblem(r);
                return p == null ? "ok" : "⚠ " + p;
            }
            return table.get(r, CriteriaColumn.values()[c]);
        }

        @Override
        public void setValueAt(Object v, int r, int c) {
            table.set(r, CriteriaColumn.values()[c], v == null ? "" : v.toString());
        }
    }

    /** Marks a bad cell by a border, a sign and its reason (tooltip and the Check column), not colour alone. */
    private final class CheckedRenderer extends DefaultTableCellRenderer {
        private static final long serialVersionUID = 1L;

        @Override
        public Component getTableCellRendererComponent(JTable t, Object v, boolean sel, boolean focus, int r, int c) {
            super.getTableCellRendererComponent(t, v, sel, focus, r, c);
            int mc = t.convertColumnIndexToModel(c);
            String problem = mc < CriteriaColumn.values().length ? table.problem(r, CriteriaColumn.values()[mc]) : null;
            boolean check = mc == CriteriaColumn.values().length;
            setToolTipText(check && !"ok".equals(v) ? table.rowProblem(r) : problem);
            setHorizontalAlignment(mc >= CriteriaColumn.LSL.ordinal() && mc <= CriteriaColumn.MARGIN.ordinal()
                    || mc == CriteriaColumn.SD_GROWTH.ordinal() || mc == CriteriaColumn.CAPABILITY.ordinal()
                    ? RIGHT : LEFT);
            Color error = UIManager.getColor("Component.error.focusedBorderColor");
            if (mc == CriteriaColumn.MARGIN.ordinal() && problem == null && !getText().isBlank()) {
                // the margin says what it is in: percent of the tolerance or the characteristic's unit
                String in = table.get(r, CriteriaColumn.MARGIN_IN);
                String unit = table.get(r, CriteriaColumn.UNIT);
                setText(getText() + (CriteriaTable.IN_PERCENT.equals(in) ? " % of tol."
                        : CriteriaTable.IN_PERCENT_USL.equals(in) ? " % of USL"
                        : unit == null || unit.isBlank() ? "" : " " + unit));
            }
            if (problem != null) {
                setText("⚠ " + getText());
                setBorder(BorderFactory.createLineBorder(error == null ? Color.RED : error, 2));
                if (!sel) {
                    setBackground(com.formdev.flatlaf.FlatLaf.isLafDark() ? new Color(0x5A, 0x2A, 0x20)
                            : new Color(0xFF, 0xE3, 0xD6));
                }
            } else if (!sel) {
                setBackground(UIManager.getColor("Table.background"));
            }
            if (check && !sel) {
                boolean ok = "ok".equals(v);
                setForeground(ok ? UIManager.getColor("Table.foreground") : errorText());
            } else if (!sel) {
                setForeground(UIManager.getColor("Table.foreground"));
            }
            if (mc == 0) {
                setFont(getFont().deriveFont(java.awt.Font.BOLD));
            }
            return this;
        }
    }
}
