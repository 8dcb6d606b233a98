package org.holdpoint.ui.swing;

import java.awt.BorderLayout;
import java.awt.Color;
import java.awt.Component;
import java.awt.GridBagConstraints;
import java.awt.GridBagLayout;
import java.awt.Insets;
import java.awt.datatransfer.DataFlavor;
import java.io.File;
import java.nio.file.Path;
import java.util.List;
import javax.swing.BorderFactory;
import javax.swing.ButtonGroup;
import javax.swing.JButton;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JRadioButton;
import javax.swing.JScrollPane;
import javax.swing.JSplitPane;
import javax.swing.JTable;
import javax.swing.JTextField;
import javax.swing.TransferHandler;
import javax.swing.UIManager;
import javax.swing.table.AbstractTableModel;
import javax.swing.table.DefaultTableCellRenderer;
import org.holdpoint.ui.model.DataForm;
import org.holdpoint.ui.model.MappingField;
import org.holdpoint.ui.model.PreviewGrid;
import org.holdpoint.ui.model.StudySession;
import org.holdpoint.ui.model.UserMessage;

/** The Data step: the before and after files (chooser or drag and drop), the sheet, the preview and the import report. */
final class DataPanel extends JPanel {
    private static final long serialVersionUID = 1L;
    private final transient StudySession session;
    private final transient DataForm form;
    private final transient Dialogs dialogs;
    private final JRadioButton oneFile = new JRadioButton("One file with both groups");
    private final JRadioButton twoFiles = new JRadioButton("A before file and an after file");
    private final JTextField file = readOnly("data");
    private final JTextField before = readOnly("before");
    private final JTextField after = readOnly("after");
    private final JTextField sheet = new JTextField(12);
    private final javax.swing.JComboBox<String> layout = new javax.swing.JComboBox<>(layoutChoices());
    private final JButton chooseFile = new JButton("Choose…");
    private final JButton chooseBefore = new JButton("Choose…");
    private final JButton chooseAfter = new JButton("Choose…");
    private final JButton swap = new JButton("Swap before/after");
    private final JButton importButton = new JButton("Import and analyse");
    private final PreviewModel previewModel = new PreviewModel();
    private final JTable preview = new JTable(previewModel);
    private final javax.swing.JTextArea report = new javax.swing.JTextArea();
    private final JLabel previewTitle = Bind.heading("What was read");
    private final JLabel criteriaInfo = Bind.hint(" ");
    private final java.util.EnumMap<MappingField, JTextField> mapping = new java.util.EnumMap<>(MappingField.class);
    private final List<Runnable> mappingRefresh = new java.util.ArrayList<>();
    /** Wraps to the width it is given; asks for little width so a long line never widens the form. */
    private final javax.swing.JTextArea detected = new javax.swing.JTextArea(2, 20) {
        private static final long serialVersionUID = 1L;

        @Override
        public java.awt.Dimension getPreferredSize() {
            java.awt.Dimension d = super.getPreferredSize();
            return new java.awt.Dimension(Math.min(d.width, 200), d.height);
        }
    };
    /** The mapping fields as laid out: three rows of four (group and labels; columns; traceability). */
    private static final MappingField[][] MAPPING_ROWS = {
        {MappingField.GROUP, MappingField.BEFORE_LABEL, MappingField.AFTER_LABEL, MappingField.VALUE},
        {MappingField.CHARACTERISTIC, MappingField.BEFORE, MappingField.AFTER, MappingField.HEADER_ROW},
        {MappingField.UNIT_ID, MappingField.LOT, MappingField.SUBGROUP, MappingField.SEQUENCE}};

    DataPanel(StudySession session, Dialogs dialogs) {
        super(new BorderLayout());
        this.session = session;
        this.form = session.dataForm();
        this.dialogs = dialogs;
        createComponents();
        layoutComponents();
        refreshForm();
        refreshData();
    }

    private static JTextField readOnly(String name) {
        JTextField t = new JTextField(40);
        t.setEditable(false);
        t.setName("data." + name);
        t.putClientProperty("JTextField.placeholderText", "no file chosen — choose one or drop it here");
        return t;
    }

    private void createComponents() {
        ButtonGroup g = new ButtonGroup();
        g.add(oneFile);
        g.add(twoFiles);
        oneFile.setMnemonic('O');
        twoFiles.setMnemonic('T');
        oneFile.addActionListener(e -> form.setSource(DataForm.Source.ONE_FILE));
        twoFiles.addActionListener(e -> form.setSource(DataForm.Source.TWO_FILES));
        chooseFile.setMnemonic('H');
        chooseFile.addActionListener(e -> choose("Choose the data file", form::setFile));
        chooseBefore.addActionListener(e -> choose("Choose the before file", form::setBefore));
        chooseAfter.addActionListener(e -> choose("Choose the after file", form::setAfter));
        swap.addActionListener(e -> form.swap());
        sheet.putClientProperty("JTextField.placeholderText", "first with data");
        sheet.setToolTipText("Sheet name or number (spreadsheets only); empty: the first sheet with data");
        Bind.text(sheet, form::sheet, form::setSheet);
        layout.setToolTipText("How the one file holds the groups; detected when left on \"detect\"");
        layout.addActionListener(e -> {
            int i = layout.getSelectedIndex();
            form.setLayout(i <= 0 ? null : LAYOUTS.get(i - 1));
        });
        for (MappingField f : MappingField.values()) {
            JTextField t = new JTextField(f == MappingField.HEADER_ROW ? 4 : 7);
            t.setName("data.mapping." + f.name().toLowerCase(java.util.Locale.ROOT));
            t.setToolTipText(f.label() + ": " + f.hint());
            t.putClientProperty("JTextField.placeholderText", "detect");
            mapping.put(f, t);
            mappingRefresh.add(Bind.text(t, () -> form.mapping(f), v -> form.setMapping(f, v)));
        }
        detected.setName("data.detected");
        detected.setEditable(false);
        detected.setLineWrap(true);
        detected.setWrapStyleWord(true);
        detected.setOpaque(false);
        detected.setFocusable(false);
        detected.setBorder(BorderFactory.createEmptyBorder());
        detected.setFont(UIManager.getFont("Label.font"));
        importButton.setMnemonic('I');
        importButton.setName("import");
        importButton.putClientProperty("JButton.buttonType", "default");
        importButton.addActionListener(e -> session.importAndAnalyse());
        for (DataForm.Property p : DataForm.Property.values()) {
            form.addListener(p, e -> refreshForm());
        }
        session.addListener(StudySession.Property.DATA, e -> refreshData());
        session.addListener(StudySession.Property.BUSY, e -> importButton.setEnabled(!session.busy()));
        preview.setAutoCreateRowSorter(false);
        preview.setFillsViewportHeight(true);
        preview.setDefaultRenderer(Object.class, new PreviewRenderer());
        preview.setName("preview");
        report.setName("report");
        report.setEditable(false);
        report.setLineWrap(true);
        report.setWrapStyleWord(true);
        report.setColumns(24);
        report.setRows(8);
        preview.getColumnModel().getColumn(PreviewGrid.Column.CHARACTERISTIC.ordinal()).setPreferredWidth(170);
        preview.getColumnModel().getColumn(PreviewGrid.Column.UNIT_ID.ordinal()).setPreferredWidth(90);
        preview.getColumnModel().getColumn(PreviewGrid.Column.VALUE.ordinal()).setPreferredWidth(90);
        preview.getColumnModel().getColumn(PreviewGrid.Column.STATUS.ordinal()).setPreferredWidth(260);
        preview.getColumnModel().getColumn(PreviewGrid.Column.GROUP.ordinal()).setPreferredWidth(60);
        preview.getColumnModel().getColumn(PreviewGrid.Column.CELL.ordinal()).setPreferredWidth(60);
        setTransferHandler(new DropFiles());
        preview.setTransferHandler(getTransferHandler());
    }

    private void layoutComponents() {
        JPanel top = new JPanel(new GridBagLayout());
        top.setBorder(BorderFactory.createEmptyBorder(16, 24, 8, 24));
        GridBagConstraints c = new GridBagConstraints();
        c.anchor = GridBagConstraints.LINE_START;
        c.insets = new Insets(4, 0, 4, 8);
        c.gridx = 0;
        c.gridy = 0;
        c.gridwidth = 4;
        top.add(Bind.heading("Open the before and after data"), c);
        c.gridy++;
        top.add(Bind.hint("Choose the files, or drop one or two files anywhere on this page. "
                + "Spreadsheets (xlsx, xls) and text files (csv, tsv)."), c);
        c.gridy++;
        JPanel radios = new JPanel(new java.awt.FlowLayout(java.awt.FlowLayout.LEFT, 0, 0));
        radios.add(oneFile);
        radios.add(javax.swing.Box.createHorizontalStrut(16));
        radios.add(twoFiles);
        top.add(radios, c);
        c.gridwidth = 1;
        fileLabel = Bind.label("Data file", 'F', file);
        beforeLabel = Bind.label("Before file", 'B', before);
        row(top, c, fileLabel, file, chooseFile);
        row(top, c, beforeLabel, before, chooseBefore);
        afterLabel = Bind.label("After file", 'A', after);
        row(top, c, afterLabel, after, chooseAfter);
        c.gridy++;
        c.gridx = 0;
        c.fill = GridBagConstraints.NONE;
        c.weightx = 0;
        top.add(Bind.label("Sheet", 'E', sheet), c);
        c.gridx = 1;
        JPanel sheetRow = new JPanel(new java.awt.FlowLayout(java.awt.FlowLayout.LEFT, 0, 0)) {
            private static final long serialVersionUID = 1L;

            @Override
            public java.awt.Dimension getMinimumSize() {
                return getPreferredSize(); // never wrap the Import button out of sight
            }
        };
        sheetRow.add(sheet);
        sheetRow.add(javax.swing.Box.createHorizontalStrut(12));
        sheetRow.add(Bind.label("Layout ", 'L', layout));
        sheetRow.add(layout);
        sheetRow.add(javax.swing.Box.createHorizontalStrut(12));
        sheetRow.add(swap);
        sheetRow.add(javax.swing.Box.createHorizontalStrut(24));
        sheetRow.add(importButton);
        top.add(sheetRow, c);
        c.gridy++;
        c.gridx = 0;
        c.anchor = GridBagConstraints.FIRST_LINE_START;
        top.add(new JLabel("Columns"), c);
        c.gridx = 1;
        c.gridwidth = 2;
        c.fill = GridBagConstraints.HORIZONTAL;
        top.add(mappingPanel(), c);
        c.gridwidth = 1;
        c.fill = GridBagConstraints.NONE;
        c.anchor = GridBagConstraints.LINE_START;
        c.gridy++;
        c.gridx = 1;
        top.add(criteriaInfo, c);
        add(top, BorderLayout.NORTH);

        JPanel left = new JPanel(new BorderLayout(0, 4));
        left.add(previewTitle, BorderLayout.NORTH);
        left.add(new JScrollPane(preview), BorderLayout.CENTER);
        JPanel right = new JPanel(new BorderLayout(0, 4));
        right.add(Bind.heading("Import report"), BorderLayout.NORTH);
        right.add(new JScrollPane(report, JScrollPane.VERTICAL_SCROLLBAR_AS_NEEDED,
                JScrollPane.HORIZONTAL_SCROLLBAR_NEVER), BorderLayout.CENTER);
        JSplitPane split = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, left, right);
        split.setResizeWeight(0.62);
        split.setBorder(BorderFactory.createEmptyBorder(8, 24, 16, 24));
        add(split, BorderLayout.CENTER);
    }

    /** The optional column mapping (blank = detected) and, below it, what the last import chose. */
    private JPanel mappingPanel() {
        JPanel p = new JPanel(new GridBagLayout());
        GridBagConstraints c = new GridBagConstraints();
        c.anchor = GridBagConstraints.LINE_START;
        c.gridx = 0;
        c.gridy = 0;
        c.gridwidth = 8;
        c.insets = new Insets(0, 0, 2, 0);
        p.add(Bind.hint("Leave a field blank to let the import find it; name a column by its header or its "
                + "letters (A, B, …)."), c);
        c.gridwidth = 1;
        for (MappingField[] row : MAPPING_ROWS) {
            c.gridy++;
            c.gridx = 0;
            for (MappingField f : row) {
                c.insets = new Insets(2, c.gridx == 0 ? 0 : 12, 2, 6);
                c.weightx = 0;
                c.fill = GridBagConstraints.NONE;
                p.add(new JLabel(f.label()) {
                    private static final long serialVersionUID = 1L;

                    {
                        setLabelFor(mapping.get(f));
                        setHorizontalAlignment(TRAILING);
                    }
                }, c);
                c.gridx++;
                c.insets = new Insets(2, 0, 2, 0);
                c.fill = GridBagConstraints.HORIZONTAL;
                c.weightx = 1;
                p.add(mapping.get(f), c);
                c.gridx++;
            }
        }
        c.gridy++;
        c.gridx = 0;
        c.gridwidth = 8;
        c.weightx = 1;
        c.fill = GridBagConstraints.HORIZONTAL;
        c.insets = new Insets(4, 0, 0, 0);
        p.add(detected, c);
        return p;
    }

    private static void row(JPanel p, GridBagConstraints c, JLabel label, JComponent field, JButton button) {
        c.gridy++;
        c.gridx = 0;
        c.weightx = 0;
        c.fill = GridBagConstraints.NONE;
        p.add(label, c);
        c.gridx = 1;
        c.weightx = 1;
        c.fill = GridBagConstraints.HORIZONTAL;
        p.add(field, c);
        c.gridx = 2;
        c.weightx = 0;
        c.fill = GridBagConstraints.NONE;
        p.add(button, c);
    }

    private void choose(String title, java.util.function.Consumer<Path> set) {
        Path p = dialogs.chooseData(title);
        if (p != null) {
            set.accept(p);
            // a chosen file is imported at once, as soon as every file the choice needs is there
            boolean complete = form.source() == DataForm.Source.ONE_FILE ? form.file() != null
                    : form.before() != null && form.after() != null;
            if (complete && !session.busy()) {
                session.importAndAnalyse();
            }
        }
    }

    private JLabel fileLabel;
    private JLabel beforeLabel;
    private JLabel afterLabel;

    private void refreshForm() {
        boolean one = form.source() == DataForm.Source.ONE_FILE;
        // only the rows of the chosen way are shown: the preview below keeps the room
        for (java.awt.Component x : new java.awt.Component[] {fileLabel, file, chooseFile}) {
            x.setVisible(one);
        }
        for (java.awt.Component x : new java.awt.Component[] {beforeLabel, before, chooseBefore, afterLabel, after,
            chooseAfter}) {
            x.setVisible(!one);
        }
        oneFile.setSelected(one);
        twoFiles.setSelected(!one);
        file.setText(form.file() == null ? "" : form.file().toString());
        before.setText(form.before() == null ? "" : form.before().toString());
        after.setText(form.after() == null ? "" : form.after().toString());
        file.setEnabled(one);
        chooseFile.setEnabled(one);
        before.setEnabled(!one);
        after.setEnabled(!one);
        chooseBefore.setEnabled(!one);
        chooseAfter.setEnabled(!one);
        swap.setEnabled(!one);
        layout.setEnabled(one);
        mappingRefresh.forEach(Runnable::run);
        int want = form.layout() == null ? 0 : LAYOUTS.indexOf(form.layout()) + 1;
        if (layout.getSelectedIndex() != want) {
            layout.setSelectedIndex(want);
        }
    }

    private static final List<org.holdpoint.study.Layout> LAYOUTS = List.of(org.holdpoint.study.Layout.STACKED,
            org.holdpoint.study.Layout.SIDE_BY_SIDE, org.holdpoint.study.Layout.WIDE,
            org.holdpoint.study.Layout.PAIRED);

    private static String[] layoutChoices() {
        java.util.List<String> l = new java.util.ArrayList<>();
        l.add("detect");
        LAYOUTS.forEach(x -> l.add(x.words()));
        return l.toArray(String[]::new);
    }

    private void refreshData() {
        PreviewGrid g = session.preview();
        previewModel.show(g);
        if (session.data() == null) {
            previewTitle.setText("What was read");
            report.setText("Nothing imported yet.");
            criteriaInfo.setText(" ");
            detected.setText("Chosen by the import: nothing imported yet.");
            return;
        }
        List<String> chosen = session.detectedLayout();
        detected.setText(chosen.isEmpty() ? "Chosen by the import: see the import report."
                : "Chosen by the import: " + String.join("\n", shortNames(chosen)));
        detected.setCaretPosition(0);
        previewTitle.setText(String.format(java.util.Locale.ROOT, "What was read (%,d of %,d cells shown; cells not "
                + "used are marked)", g.rows().size(), g.total()));
        report.setText(String.join("\n", PreviewGrid.reportLines(session.data().report())));
        report.setCaretPosition(0);
        Path cf = session.criteriaFile();
        criteriaInfo.setText(cf == null ? "No criteria file was found beside the data; criteria typed before are "
                + "kept, the others are set on the next step." : "Criteria read from " + cf.getFileName() + " (edit them on the Criteria step).");
    }

    /** The import's lines with the chosen files named by file name only (the full paths are above). */
    private List<String> shortNames(List<String> lines) {
        List<String> out = new java.util.ArrayList<>();
        for (String line : lines) {
            for (Path p : new Path[] {form.file(), form.before(), form.after()}) {
                if (p != null && p.getFileName() != null) {
                    line = line.replace(p.toString(), p.getFileName().toString());
                }
            }
            out.add(line);
        }
        return out;
    }

    /** @return the Import button (default button of this step) */
    JButton importButton() {
        return importButton;
    }

    /** The preview grid as a table. */
    private static final class PreviewModel extends AbstractTableModel {
        private static final long serialVersionUID = 1L;
        private transient PreviewGrid grid = PreviewGrid.EMPTY;

        void show(PreviewGrid g) {
            grid = g;
            fireTableDataChanged();
        }

        PreviewGrid.Row row(int r) {
            return grid.rows().get(r);
        }

        @Override
        public int getRowCount() {
            return grid.rows().size();
        }

        @Override
        public int getColumnCount() {
            return PreviewGrid.Column.values().length;
        }

        @Override
        public String getColumnName(int c) {
            return PreviewGrid.Column.values()[c].label();
        }

        @Override
        public Object getValueAt(int r, int c) {
            return grid.rows().get(r).cell(PreviewGrid.Column.values()[c]);
        }
    }

    /** Marks cells not used: a warning background, a "!" and the reason as tooltip, not only colour. */
    private final class PreviewRenderer extends DefaultTableCellRenderer {
        private static final long serialVersionUID = 1L;

        @Override
        public Component getTableCellRendererComponent(JTable t, Object v, boolean sel, boolean focus, int r, int c) {
            super.getTableCellRendererComponent(t, v, sel, focus, r, c);
            PreviewGrid.Row row = previewModel.row(t.convertRowIndexToModel(r));
            boolean bad = row.skipped() != null;
            setToolTipText(bad ? row.origin().describe() + ": " + row.skipped().words() : null);
            if (bad && !sel) {
                boolean dark = com.formdev.flatlaf.FlatLaf.isLafDark();
                setBackground(dark ? new Color(0x5A, 0x2A, 0x20) : new Color(0xFF, 0xE3, 0xD6));
            } else if (!sel) {
                setBackground(UIManager.getColor("Table.background"));
            }
            if (bad && c == PreviewGrid.Column.STATUS.ordinal()) {
                setText("⚠ " + getText());
            }
            return this;
        }
    }

    /** Accepts one or two files dropped on the step. */
    private final class DropFiles extends TransferHandler {
        private static final long serialVersionUID = 1L;

        @Override
        public boolean canImport(TransferSupport s) {
            return s.isDataFlavorSupported(DataFlavor.javaFileListFlavor);
        }

        @Override
        public boolean importData(TransferSupport s) {
            try {
                @SuppressWarnings("unchecked")
                List<File> files = (List<File>) s.getTransferable().getTransferData(DataFlavor.javaFileListFlavor);
                form.drop(files.stream().map(File::toPath).toList());
                return true;
            } catch (IllegalArgumentException e) {
                session.problem(new UserMessage("Cannot use these files", e.getMessage(), ""));
                return false;
            } catch (java.awt.datatransfer.UnsupportedFlavorException | java.io.IOException e) {
                session.problem(new UserMessage("Cannot use the dropped items", "The dropped items are not files.",
                        "Drop files from the file manager, or use Choose…."));
                return false;
            }
        }
    }
}
