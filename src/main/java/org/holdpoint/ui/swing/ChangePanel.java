package org.holdpoint.ui.swing;

import java.awt.BorderLayout;
import java.awt.GridBagConstraints;
import java.awt.GridBagLayout;
import java.awt.Insets;
import java.util.EnumMap;
import java.util.Map;
import javax.swing.BorderFactory;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTextArea;
import javax.swing.JTextField;
import org.holdpoint.study.ChangeKind;
import org.holdpoint.ui.model.ChangeForm;
import org.holdpoint.ui.model.ChangeForm.Field;

/** The Change step: what changed and why. */
final class ChangePanel extends JPanel {
    private static final long serialVersionUID = 1L;
    private static final Map<Field, Character> MNEMONICS = Map.of(Field.ID, 'I', Field.TITLE, 'T', Field.KIND, 'K',
            Field.PART_NUMBER, 'P', Field.REVISION, 'V', Field.REASON, 'A', Field.REQUESTER, 'B', Field.REQUEST_DATE, 'Q',
            Field.STUDY_DATE, 'U');
    private final Map<Field, javax.swing.JLabel> problems = new EnumMap<>(Field.class);
    private final transient ChangeForm form;
    private final Map<Field, JComponent> fields = new EnumMap<>(Field.class);
    private JComboBox<String> kind;

    ChangePanel(ChangeForm form) {
        super(new BorderLayout());
        this.form = form;
        createComponents();
        layoutComponents();
    }

    private void createComponents() {
        for (Field f : Field.values()) {
            if (f == Field.KIND) {
                kind = new JComboBox<>(java.util.Arrays.stream(ChangeKind.values()).map(ChangeKind::words)
                        .toArray(String[]::new));
                kind.setSelectedItem(form.get(Field.KIND));
                kind.addActionListener(e -> form.set(Field.KIND, (String) kind.getSelectedItem()));
                form.addListener(Field.KIND, e -> kind.setSelectedItem(form.get(Field.KIND)));
                fields.put(f, kind);
                continue;
            }
            javax.swing.text.JTextComponent t = f == Field.REASON ? new JTextArea(4, 40) : new JTextField(30);
            if (t instanceof JTextArea a) {
                a.setLineWrap(true);
                a.setWrapStyleWord(true);
            }
            t.setName("change." + f.name());
            Runnable refresh = Bind.text(t, () -> form.get(f), v -> form.set(f, v));
            javax.swing.JLabel problem = Bind.errorLabel();
            problem.setName("change.problem." + f.name());
            problems.put(f, problem);
            form.addListener(f, e -> {
                refresh.run();
                String p = form.problem(f);
                problem.setText(p == null ? " " : "\u26a0 " + p);
            });
            fields.put(f, t);
        }
        for (Field f : new Field[] {Field.REQUEST_DATE, Field.STUDY_DATE}) {
            ((JTextField) fields.get(f)).putClientProperty("JTextField.placeholderText", "yyyy-mm-dd");
            ((JTextField) fields.get(f)).setColumns(12);
        }
        ((JTextField) fields.get(Field.ID)).putClientProperty("JTextField.placeholderText", "e.g. CR-2026-0412");
        ((JTextField) fields.get(Field.TITLE)).putClientProperty("JTextField.placeholderText",
                "one line, e.g. New insert grade for the finishing pass");
    }

    private void layoutComponents() {
        JPanel grid = new JPanel(new GridBagLayout());
        GridBagConstraints c = new GridBagConstraints();
        c.insets = new Insets(6, 0, 6, 12);
        c.anchor = GridBagConstraints.FIRST_LINE_START;
        c.gridy = 0;
        c.gridx = 0;
        c.gridwidth = 2;
        grid.add(Bind.heading("Describe the change"), c);
        c.gridy++;
        grid.add(Bind.hint("This header goes into the study file and the sign-off record."), c);
        c.gridwidth = 1;
        for (Field f : Field.values()) {
            c.gridy++;
            c.gridx = 0;
            c.weightx = 0;
            c.fill = GridBagConstraints.NONE;
            c.insets = new Insets(6, 0, 6, 12);
            JComponent field = fields.get(f);
            c.anchor = field instanceof JTextArea ? GridBagConstraints.FIRST_LINE_START
                    : GridBagConstraints.BASELINE_LEADING;
            grid.add(Bind.label(f.label(), MNEMONICS.get(f), field), c);
            c.gridx = 1;
            c.weightx = 1;
            c.fill = GridBagConstraints.HORIZONTAL;
            if (f == Field.REQUEST_DATE || f == Field.STUDY_DATE) {
                JPanel row = new JPanel(new java.awt.FlowLayout(java.awt.FlowLayout.LEFT, 0, 0));
                row.add(field);
                row.add(javax.swing.Box.createHorizontalStrut(12));
                row.add(problems.get(f));
                c.fill = GridBagConstraints.NONE;
                grid.add(row, c);
            } else {
                grid.add(field instanceof JTextArea ? new JScrollPane(field) : field, c);
            }
        }
        c.gridy++;
        c.weighty = 1;
        grid.add(new JPanel(), c);
        grid.setBorder(BorderFactory.createEmptyBorder(16, 24, 16, 24));
        JPanel narrow = new JPanel(new BorderLayout());
        narrow.add(grid, BorderLayout.CENTER);
        narrow.setMaximumSize(new java.awt.Dimension(900, Integer.MAX_VALUE));
        JPanel holder = new JPanel();
        holder.setLayout(new javax.swing.BoxLayout(holder, javax.swing.BoxLayout.X_AXIS));
        holder.add(narrow);
        holder.add(javax.swing.Box.createHorizontalGlue());
        add(holder, BorderLayout.CENTER);
    }

    /** @return the field that gets the focus when the step opens */
    JComponent firstField() {
        return fields.get(Field.ID);
    }
}
