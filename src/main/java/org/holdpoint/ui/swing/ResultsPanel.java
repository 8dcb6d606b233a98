package org.holdpoint.ui.swing;

import java.awt.BorderLayout;
import java.awt.Component;
import java.awt.FlowLayout;
import java.util.Comparator;
import java.util.List;
import javax.swing.BorderFactory;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JSplitPane;
import javax.swing.JTable;
import javax.swing.ListSelectionModel;
import javax.swing.RowFilter;
import javax.swing.table.AbstractTableModel;
import javax.swing.table.DefaultTableCellRenderer;
import javax.swing.table.TableRowSorter;
import org.holdpoint.chart.NamedChart;
import org.holdpoint.chart.StudyCharts;
import org.holdpoint.study.CharacteristicData;
import org.holdpoint.result.CharacteristicResult;
import org.holdpoint.ui.model.ResultColumn;
import org.holdpoint.ui.model.ResultDetail;
import org.holdpoint.ui.model.ResultsTable;
import org.holdpoint.ui.model.StudySession;
import org.holdpoint.ui.model.VerdictLook;
import org.holdpoint.result.Format;
import org.jfree.chart.JFreeChart;

/** The Results step: one row per characteristic, sortable and filterable; the selected one in detail with its chart. */
final class ResultsPanel extends JPanel {
    private static final long serialVersionUID = 1L;
    private final transient StudySession session;
    private final transient ResultsTable results;
    private final Model model = new Model();
    private final JTable table = new JTable(model);
    private final TableRowSorter<Model> sorter = new TableRowSorter<>(model);
    private final JComboBox<ResultsTable.Filter> filter = new JComboBox<>(ResultsTable.Filter.values());
    private final JLabel shown = new JLabel(" ");
    private final DetailView detail = new DetailView();
    private final javax.swing.JTabbedPane chartTabs = new javax.swing.JTabbedPane();
    private final transient java.util.concurrent.ExecutorService renderer =
            java.util.concurrent.Executors.newSingleThreadExecutor(r -> {
                Thread t = new Thread(r, "holdpoint-charts");
                t.setDaemon(true);
                return t;
            });
    private final ChartView[] charts = {new ChartView(renderer), new ChartView(renderer), new ChartView(renderer),
        new ChartView(renderer)};
    private final JLabel chartNote = new JLabel(" ", JLabel.CENTER);
    private JSplitPane split;

    ResultsPanel(StudySession session) {
        super(new BorderLayout());
        this.session = session;
        this.results = session.results();
        createComponents();
        layoutComponents();
        refreshRows();
    }

    private void createComponents() {
        table.setName("results");
        table.setRowSorter(sorter);
        table.setSelectionMode(ListSelectionModel.SINGLE_SELECTION);
        table.setRowHeight(Math.max(table.getRowHeight(), 28));
        table.setFillsViewportHeight(true);
        table.setDefaultRenderer(VerdictLook.class, new VerdictRenderer());
        table.setDefaultRenderer(Double.class, new NumberRenderer((r, c) -> results == null ? null
                : results.text(r, ResultColumn.values()[c])));
        table.setDefaultRenderer(String.class, new DefaultTableCellRenderer() {
            private static final long serialVersionUID = 1L;

            @Override
            public Component getTableCellRendererComponent(JTable t, Object v, boolean s, boolean f, int r, int c) {
                super.getTableCellRendererComponent(t, v, s, f, r, c);
                setToolTipText(v == null || v.toString().isEmpty() ? null : v.toString());
                return this;
            }
        });
        sorter.setComparator(ResultColumn.VERDICT.ordinal(), Comparator.comparingInt(VerdictLook::urgency));
        sorter.setRowFilter(new RowFilter<Model, Integer>() {
            @Override
            public boolean include(Entry<? extends Model, ? extends Integer> e) {
                return results.shows(e.getIdentifier());
            }
        });
        // fits 1280 pixels wide without cutting the usual names and numbers; a cut cell shows its text as a tip
        int[] widths = {100, 185, 290, 45, 90, 190, 90, 70};
        for (int i = 0; i < widths.length; i++) {
            table.getColumnModel().getColumn(i).setPreferredWidth(widths[i]);
        }
        table.getSelectionModel().addListSelectionListener(e -> {
            if (!e.getValueIsAdjusting() && table.getSelectedRow() >= 0) {
                results.select(results.row(table.convertRowIndexToModel(table.getSelectedRow())).name());
            }
        });
        filter.setName("filter");
        filter.addActionListener(e -> results.setFilter((ResultsTable.Filter) filter.getSelectedItem()));
        results.addListener(ResultsTable.Property.FILTER, e -> {
            filter.setSelectedItem(results.filter());
            sorter.allRowsChanged();
            refreshShown();
        });
        results.addListener(ResultsTable.Property.RESULT, e -> refreshRows());
        results.addListener(ResultsTable.Property.SELECTED, e -> refreshDetail());
        detail.setName("detail");
        String[] titles = {"Box plot", "Histograms", "Probability plot", "Control chart"};
        for (int i = 0; i < charts.length; i++) {
            chartTabs.addTab(titles[i], charts[i]);
        }
        chartTabs.setMnemonicAt(0, 'B');
        chartTabs.setMnemonicAt(1, 'G');
        chartTabs.setMnemonicAt(2, 'Y');
        chartTabs.setMnemonicAt(3, 'O');
        chartTabs.setName("charts");
    }



    private void layoutComponents() {
        JPanel top = new JPanel(new BorderLayout());
        top.setBorder(BorderFactory.createEmptyBorder(16, 24, 8, 24));
        top.add(Bind.heading("Verdict per characteristic"), BorderLayout.NORTH);
        JPanel tools = new JPanel(new FlowLayout(FlowLayout.LEFT, 8, 4));
        tools.add(Bind.label("Show", 'W', filter));
        tools.add(filter);
        tools.add(shown);
        tools.add(javax.swing.Box.createHorizontalStrut(24));
        javax.swing.JButton exclude = new javax.swing.JButton("Exclude a value…");
        exclude.setMnemonic('X');
        exclude.setToolTipText("Leave one value of the selected characteristic out, with a reason the record keeps");
        exclude.addActionListener(e -> excludeValue());
        tools.add(exclude);
        javax.swing.JButton restore = new javax.swing.JButton("Take back exclusions");
        restore.addActionListener(e -> session.clearExclusions());
        tools.add(restore);
        top.add(tools, BorderLayout.CENTER);
        top.add(Bind.hint("Difference = after − before; equivalence interval at 1 − 2α; sd ratio = sd(after)/sd(before)."
                + " Click a heading to sort; select a row for its numbers and charts."), BorderLayout.SOUTH);
        add(top, BorderLayout.NORTH);
        JScrollPane detailScroll = new JScrollPane(detail);
        JPanel chartBox = new JPanel(new BorderLayout());
        chartBox.add(chartTabs, BorderLayout.CENTER);
        chartBox.add(chartNote, BorderLayout.SOUTH);
        JSplitPane lower = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, detailScroll, chartBox);
        lower.setResizeWeight(0.4);
        Bind.keepProportion(lower, 0.4);
        split = new JSplitPane(JSplitPane.VERTICAL_SPLIT, new JScrollPane(table), lower);
        split.setResizeWeight(0.42);
        split.setBorder(BorderFactory.createEmptyBorder(0, 24, 12, 24));
        // on every resize the table again gets the height of its rows (up to half the step), so a window made
        // smaller still shows every row of a short study, failures included
        split.addComponentListener(new java.awt.event.ComponentAdapter() {
            @Override
            public void componentResized(java.awt.event.ComponentEvent e) {
                fitTable();
            }
        });
        add(split, BorderLayout.CENTER);
    }

    private void refreshRows() {
        String keep = results.selected();
        model.fireTableDataChanged();
        javax.swing.SwingUtilities.invokeLater(this::fitTable);
        refreshShown();
        selectInTable(keep);
        refreshDetail();
    }

    private void excludeValue() {
        CharacteristicResult r = results.selectedResult();
        if (r == null) {
            return;
        }
        // pick the value from the list (each with its group, cell and value), or type its cell
        java.util.List<String> picks = new java.util.ArrayList<>();
        org.holdpoint.study.CharacteristicData data = session.characteristic(r.name());
        if (data != null) {
            for (int g = 0; g < 2 && picks.size() < MAX_PICKS; g++) {
                org.holdpoint.study.GroupData group = g == 0 ? data.before() : data.after();
                for (int i = 0; i < group.size() && picks.size() < MAX_PICKS; i++) {
                    var o = group.origin(i);
                    picks.add((g == 0 ? "before:" : "after:") + (o.sheet() == null || o.sheet().isBlank() ? ""
                            : o.sheet() + "!") + o.cell() + "   (value " + Format.num(group.sample().value(i)) + ")");
                }
            }
        }
        javax.swing.JComboBox<String> cell = new javax.swing.JComboBox<>(picks.toArray(String[]::new));
        cell.setEditable(true);
        cell.setSelectedItem("");
        cell.setMaximumRowCount(16);
        javax.swing.JTextField reason = new javax.swing.JTextField(30);
        JPanel p = new JPanel(new java.awt.GridLayout(0, 1, 0, 4));
        p.add(new JLabel("Leave one value of \"" + r.name() + "\" out of the analysis."));
        p.add(Bind.label("The value: pick it from the list, or type its cell, e.g. after:D12", 'V', cell));
        p.add(cell);
        p.add(Bind.label("Reason (kept in the record)", 'R', reason));
        p.add(reason);
        while (javax.swing.JOptionPane.showConfirmDialog(this, p, "Exclude a value",
                javax.swing.JOptionPane.OK_CANCEL_OPTION, javax.swing.JOptionPane.PLAIN_MESSAGE)
                == javax.swing.JOptionPane.OK_OPTION) {
            Object chosen = cell.getEditor().getItem();
            String text = chosen == null ? "" : chosen.toString();
            int cut = text.indexOf("   (value ");
            String why = session.exclude(r.name(), cut > 0 ? text.substring(0, cut) : text.trim(), reason.getText());
            if (why == null) {
                return;
            }
            javax.swing.JOptionPane.showMessageDialog(this, why, "Exclude a value",
                    javax.swing.JOptionPane.WARNING_MESSAGE);
        }
    }

    /** The most values the exclusion list offers (a longer list is typed into instead). */
    private static final int MAX_PICKS = 5000;

    /** Gives the table the height of its rows (at most half the step), so that a short study shows whole. */
    private void fitTable() {
        int h = split.getHeight();
        if (h <= 0 || table.getRowCount() == 0) {
            return;
        }
        int want = table.getTableHeader().getPreferredSize().height + table.getRowCount() * table.getRowHeight() + 6;
        split.setDividerLocation(Math.min(h * 11 / 20, Math.max(h / 4, want)));
    }

    private void selectInTable(String name) {
        for (int v = 0; v < table.getRowCount(); v++) {
            if (results.row(table.convertRowIndexToModel(v)).name().equals(name)) {
                table.setRowSelectionInterval(v, v);
                return;
            }
        }
    }

    private void refreshShown() {
        shown.setText(results.rowCount() == 0 ? "" : results.shownCount() + " of " + results.rowCount() + " shown");
    }

    private void refreshDetail() {
        CharacteristicResult r = results.selectedResult();
        if (r == null) {
            detail.message("No characteristic selected.");
            setCharts(null);
            chartNote.setText(" ");
            return;
        }
        detail.show(r.name(), ResultDetail.of(r, results.decimals(r.name())));
        drawChart(session.characteristic(r.name()), r);
    }

    private void drawChart(CharacteristicData data, CharacteristicResult r) {
        if (data == null) {
            setCharts(null);
            chartNote.setText("No data for a chart.");
            return;
        }
        chartNote.setText(" ");
        java.util.concurrent.atomic.AtomicReference<List<NamedChart>> built = new java.util.concurrent.atomic.AtomicReference<>();
        boolean runOrder = r.checks() != null && r.checks().stability() != null;
        for (int i = 0; i < charts.length; i++) {
            int k = i;
            if (k == 3 && !runOrder) {
                charts[k].clear("No run order is known for this characteristic: with a sequence column in the data "
                        + "(e.g. \"run order\") the control chart of both phases is drawn here.");
                continue;
            }
            // Runs on the render thread, in order: the first view builds all the charts once.
            charts[i].show(() -> {
                if (built.get() == null) {
                    built.set(StudyCharts.withDefaults().characteristicCharts(1, 1, r, data));
                }
                return built.get().get(k).chart();
            });
        }
    }

    private void setCharts(List<JFreeChart> list) {
        for (ChartView c : charts) {
            c.clear(" ");
        }
    }

    /** @return the results table (for tests) */
    JTable table() {
        return table;
    }

    /** @return the box plot view (for tests) */
    ChartView boxPlotView() {
        return charts[0];
    }

    /** The results as a table, typed for sorting. */
    private final class Model extends AbstractTableModel {
        private static final long serialVersionUID = 1L;

        @Override
        public int getRowCount() {
            return results == null ? 0 : results.rowCount();
        }

        @Override
        public int getColumnCount() {
            return ResultColumn.values().length;
        }

        @Override
        public String getColumnName(int c) {
            return ResultColumn.values()[c].label();
        }

        @Override
        public Class<?> getColumnClass(int c) {
            return ResultColumn.values()[c].type();
        }

        @Override
        public Object getValueAt(int r, int c) {
            return results.value(r, ResultColumn.values()[c]);
        }
    }

    /** The verdict's shape and words. */
    static final class VerdictRenderer extends DefaultTableCellRenderer {
        private static final long serialVersionUID = 1L;

        @Override
        public Component getTableCellRendererComponent(JTable t, Object v, boolean sel, boolean focus, int r, int c) {
            super.getTableCellRendererComponent(t, v, sel, focus, r, c);
            VerdictLook look = (VerdictLook) v;
            // words first, the mark after them
            setIcon(new VerdictIcon(look, 16));
            setText(look.words());
            setHorizontalTextPosition(LEADING);
            setIconTextGap(8);
            return this;
        }
    }

    /** Numbers right-aligned, "undefined" for a missing value, a dash where nothing was computed. */
    static final class NumberRenderer extends DefaultTableCellRenderer {
        private static final long serialVersionUID = 1L;
        private final transient java.util.function.BiFunction<Integer, Integer, String> texts;
        private boolean notComputed;
        private String shown;

        NumberRenderer() {
            this(null);
        }

        /**
         * @param texts the shown text of a cell by model row and column (null: six significant digits)
         */
        NumberRenderer(java.util.function.BiFunction<Integer, Integer, String> texts) {
            this.texts = texts;
            setHorizontalAlignment(RIGHT);
        }

        @Override
        public java.awt.Component getTableCellRendererComponent(JTable t, Object value, boolean selected,
                boolean focus, int row, int column) {
            Object look = t.getModel().getValueAt(t.convertRowIndexToModel(row), ResultColumn.VERDICT.ordinal());
            notComputed = look == org.holdpoint.ui.model.VerdictLook.NOT_ASSESSABLE;
            shown = texts == null || value == null ? null : texts.apply(t.convertRowIndexToModel(row),
                    t.convertColumnIndexToModel(column));
            java.awt.Component c = super.getTableCellRendererComponent(t, value, selected, focus, row, column);
            setToolTipText(notComputed ? "not computed: the characteristic is not assessable (see its reason)" : null);
            return c;
        }

        @Override
        protected void setValue(Object v) {
            setText(v == null ? notComputed ? "\u2014" : "undefined" : shown != null ? shown : Format.num((Double) v));
        }
    }

    /** @return the component that gets the focus when the step opens */
    JComponent focusTarget() {
        return table;
    }
}
