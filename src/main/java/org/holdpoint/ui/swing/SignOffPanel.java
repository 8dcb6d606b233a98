package org.holdpoint.ui.swing;

import java.awt.BorderLayout;
import java.awt.FlowLayout;
import java.awt.GridBagConstraints;
import java.awt.GridBagLayout;
import java.awt.Insets;
import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTable;
import javax.swing.JTextField;
import javax.swing.table.AbstractTableModel;
import org.holdpoint.study.Signature;
import org.holdpoint.ui.model.SignOffForm;
import org.holdpoint.ui.model.StudySession;

/** The Sign-off step: who signs, in which role and with what meaning; save the study file; write the workbook. */
final class SignOffPanel extends JPanel {
    private static final long serialVersionUID = 1L;
    private final transient StudySession session;
    private final transient Actions actions;
    private final JComboBox<Signature.Stage> stage = new JComboBox<>(Signature.Stage.values());
    private final JTextField name = new JTextField(24);
    private final JTextField role = new JTextField(24);
    private final JComboBox<String> meaning = new JComboBox<>(new String[] {"prepared the study and its data",
        "reviewed the analysis and the criteria", "approved the change for production"});
    private final JButton sign = new JButton("Add signature");
    private final JLabel signProblem = new JLabel(" ");
    private final SignaturesModel signatures = new SignaturesModel();
    private final JButton save = new JButton("Save study file…");
    private final JButton workbook = new JButton("Write sign-off workbook…");
    private final JButton archive = new JButton("Save to archive…");
    private final JButton removeVoid = new JButton("Remove void signatures");
    private final JLabel verdict = new JLabel(" ");
    private final JLabel record = new JLabel(" ");

    /** What the step asks the window to do. */
    interface Actions {
        /** Saves the study file (asking where when it has none). */
        void save();

        /** Writes the workbook (asking where). */
        void writeWorkbook();

        /** @return why the workbook cannot be written in this build, or null when it can */
        String workbookUnavailable();

        /** Saves the study to the change-record archive (asking who and why). */
        void saveToArchive();
    }

    SignOffPanel(StudySession session, Actions actions) {
        super(new BorderLayout());
        this.session = session;
        this.actions = actions;
        createComponents();
        layoutComponents();
        refresh();
    }

    private void createComponents() {
        stage.setRenderer(new javax.swing.DefaultListCellRenderer() {
            private static final long serialVersionUID = 1L;

            @Override
            public java.awt.Component getListCellRendererComponent(javax.swing.JList<?> l, Object v, int i,
                    boolean s, boolean f) {
                return super.getListCellRendererComponent(l, ((Signature.Stage) v).words(), i, s, f);
            }
        });
        meaning.setEditable(true);
        name.setName("sign.name");
        role.setName("sign.role");
        sign.setMnemonic('G');
        sign.setName("sign");
        sign.addActionListener(e -> sign());
        save.setMnemonic('V');
        save.setName("save");
        save.addActionListener(e -> actions.save());
        workbook.setMnemonic('W');
        workbook.setName("workbook");
        workbook.addActionListener(e -> actions.writeWorkbook());
        archive.setMnemonic('A');
        archive.setName("saveToArchive");
        archive.setToolTipText("Archives the study as an immutable version (a correction supersedes the current one)");
        archive.addActionListener(e -> actions.saveToArchive());
        removeVoid.setName("removeVoid");
        removeVoid.setToolTipText("Removes the signatures that signed an earlier record; the people concerned sign "
                + "again");
        removeVoid.addActionListener(e -> {
            int n = session.signOff().removeVoid();
            session.problem(new org.holdpoint.ui.model.UserMessage("Void signatures removed", n
                    + " signature(s) of an earlier record were removed.", "Ask the people concerned to sign the "
                    + "current record."));
        });
        record.setName("sign.record");
        session.signOff().addListener(SignOffForm.Property.SIGNATURES, e -> {
            signatures.fireTableDataChanged();
            refresh();
        });
        session.results().addListener(org.holdpoint.ui.model.ResultsTable.Property.RESULT, e -> refresh());
        session.addListener(StudySession.Property.BUSY, e -> refresh());
    }

    private void layoutComponents() {
        JPanel form = new JPanel(new GridBagLayout());
        form.setBorder(BorderFactory.createEmptyBorder(16, 24, 8, 24));
        GridBagConstraints c = new GridBagConstraints();
        c.anchor = GridBagConstraints.LINE_START;
        c.insets = new Insets(5, 0, 5, 12);
        c.gridx = 0;
        c.gridy = 0;
        c.gridwidth = 3;
        form.add(Bind.heading("Sign off the change"), c);
        c.gridy++;
        form.add(verdict, c);
        c.gridy++;
        form.add(record, c);
        c.gridy++;
        form.add(Bind.hint("A signature here records who signed, in which role and what it means. It is not an "
                + "electronic signature under regulated electronic-record rules."), c);
        c.gridwidth = 1;
        addRow(form, c, Bind.label("Stage", 'T', stage), stage);
        addRow(form, c, Bind.label("Printed name", 'N', name), name);
        addRow(form, c, Bind.label("Role", 'R', role), role);
        addRow(form, c, Bind.label("Meaning", 'M', meaning), meaning);
        c.gridy++;
        c.gridx = 1;
        JPanel signRow = new JPanel(new FlowLayout(FlowLayout.LEFT, 0, 0));
        signRow.add(sign);
        signRow.add(javax.swing.Box.createHorizontalStrut(12));
        signRow.add(signProblem);
        form.add(signRow, c);
        add(form, BorderLayout.NORTH);
        JTable list = new JTable(signatures);
        list.setName("signatures");
        list.setFillsViewportHeight(true);
        JPanel mid = new JPanel(new BorderLayout(0, 4));
        mid.setBorder(BorderFactory.createEmptyBorder(8, 24, 8, 24));
        mid.add(Bind.heading("Signatures"), BorderLayout.NORTH);
        mid.add(new JScrollPane(list), BorderLayout.CENTER);
        JPanel listActions = new JPanel(new FlowLayout(FlowLayout.LEFT, 0, 0));
        listActions.add(removeVoid);
        mid.add(listActions, BorderLayout.SOUTH);
        add(mid, BorderLayout.CENTER);
        JPanel out = new JPanel(new FlowLayout(FlowLayout.LEFT, 12, 8));
        out.setBorder(BorderFactory.createEmptyBorder(0, 12, 16, 24));
        out.add(save);
        out.add(workbook);
        out.add(archive);
        // whoever signs reads every caution here, in full
        javax.swing.JTextArea cautions = new javax.swing.JTextArea("Before signing: "
                + String.join(" ", org.holdpoint.study.Cautions.TEXT));
        cautions.setName("sign.cautions");
        cautions.setEditable(false);
        cautions.setFocusable(false);
        cautions.setLineWrap(true);
        cautions.setWrapStyleWord(true);
        cautions.setOpaque(false);
        cautions.setBorder(BorderFactory.createEmptyBorder(0, 24, 0, 24));
        JPanel south = new JPanel(new BorderLayout());
        south.add(cautions, BorderLayout.NORTH);
        south.add(out, BorderLayout.SOUTH);
        add(south, BorderLayout.SOUTH);
    }

    private static void addRow(JPanel p, GridBagConstraints c, JLabel l, java.awt.Component f) {
        c.gridy++;
        c.gridx = 0;
        c.fill = GridBagConstraints.NONE;
        c.anchor = GridBagConstraints.BASELINE_LEADING;
        p.add(l, c);
        c.gridx = 1;
        c.fill = GridBagConstraints.HORIZONTAL;
        p.add(f, c);
        c.gridx = 2;
        c.weightx = 1;
        p.add(javax.swing.Box.createHorizontalGlue(), c);
        c.weightx = 0;
        c.anchor = GridBagConstraints.LINE_START;
    }

    private void sign() {
        Object m = meaning.getEditor().getItem();
        String text = m == null ? "" : m.toString();
        String p = SignOffForm.problem(name.getText(), role.getText(), text);
        if (p != null) {
            signProblem.setText("⚠ " + p);
            return;
        }
        var stale = session.notCurrent("sign the record");
        if (stale != null) {
            signProblem.setText("⚠ " + stale.what());
            return;
        }
        signProblem.setText(" ");
        session.sign((Signature.Stage) stage.getSelectedItem(), name.getText(), role.getText(), text);
        name.setText("");
        role.setText("");
    }

    private void refresh() {
        boolean analysed = session.results().result() != null;
        verdict.setIcon(new VerdictIcon(session.results().overallLook(), 18));
        verdict.setText(session.results().overallWords());
        save.setEnabled(!session.busy() && session.data() != null);
        String why = actions.workbookUnavailable();
        String stale = session.results().staleBecause();
        int voids = session.signOff().voidCount();
        boolean current = analysed && stale == null;
        workbook.setEnabled(!session.busy() && current && why == null && voids == 0);
        workbook.setToolTipText(why != null ? why : !analysed ? "Analyse the study first"
                : stale != null ? "The results are out of date (" + stale + "): analyse again first"
                : voids > 0 ? "Remove the void signatures first" : "The sign-off workbook with the raw data embedded");
        archive.setEnabled(!session.busy() && session.data() != null && current && voids == 0);
        sign.setEnabled(!session.busy() && current);
        sign.setToolTipText(current ? "Signs the record as analysed now" : "Analyse the study (again) first");
        removeVoid.setVisible(voids > 0);
        String rec = session.signOff().currentRecord();
        record.setText(stale != null ? "The results are out of date: " + stale + ". Analyse again (F5) before signing."
                : voids > 0 ? voids + " signature(s) signed an earlier record and are void; remove them before writing."
                : rec == null ? " " : "Record SHA-256 " + rec);
    }

    private static String abbrev(String sha) {
        return sha == null ? "" : sha.substring(0, Math.min(12, sha.length())) + "…";
    }

    /** The signatures so far. */
    private final class SignaturesModel extends AbstractTableModel {
        private static final long serialVersionUID = 1L;
        private final String[] cols = {"Stage", "Printed name", "Role", "Meaning", "Signed at", "Applies to"};

        @Override
        public int getRowCount() {
            return session.signOff().signatures().size();
        }

        @Override
        public int getColumnCount() {
            return cols.length;
        }

        @Override
        public String getColumnName(int c) {
            return cols[c];
        }

        @Override
        public Object getValueAt(int r, int c) {
            Signature s = session.signOff().signatures().get(r);
            return switch (c) {
                case 0 -> s.stage().words();
                case 1 -> s.name();
                case 2 -> s.role();
                case 3 -> s.meaning();
                case 4 -> s.timestamp();
                default -> session.signOff().isVoid(s) ? "VOID: an earlier record " + abbrev(s.record())
                        : s.record() == null ? "the record when written" : "this record " + abbrev(s.record());
            };
        }
    }

}
