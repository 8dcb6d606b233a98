package org.holdpoint.ui.swing;

import java.awt.BorderLayout;
import java.awt.FlowLayout;
import java.awt.Font;
import java.awt.GridBagConstraints;
import java.awt.GridBagLayout;
import java.awt.Insets;
import java.util.EnumMap;
import java.util.Map;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import javax.swing.BorderFactory;
import javax.swing.ButtonGroup;
import javax.swing.JButton;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JRadioButton;
import javax.swing.JScrollPane;
import javax.swing.JSplitPane;
import javax.swing.JTextArea;
import javax.swing.JTextField;
import org.holdpoint.chart.ChartTheme;
import org.holdpoint.chart.PowerCurveChart;
import org.holdpoint.stats.Design;
import org.holdpoint.ui.model.PlanForm;
import org.holdpoint.ui.model.PlanForm.Field;
import org.holdpoint.ui.model.StudySession;

/**
 * The Plan step: the typed values (each with its problem beside it) on the left; the sizes, powers and
 * the power curve of the plan on the right.
 */
final class PlanPanel extends JPanel {
    private static final long serialVersionUID = 1L;
    private final transient StudySession session;
    private final transient PlanForm form;
    private final Map<Field, JTextField> fields = new EnumMap<>(Field.class);
    private final Map<Field, JLabel> problems = new EnumMap<>(Field.class);
    private final Map<Field, JLabel> labels = new EnumMap<>(Field.class);
    private final JComboBox<String> characteristic = new JComboBox<>();
    private final JComboBox<PlanForm.MarginMode> marginMode = new JComboBox<>(PlanForm.MarginMode.values());
    private final JRadioButton parallel = new JRadioButton("Two groups (different parts before and after)");
    private final JRadioButton paired = new JRadioButton("Paired (the same parts measured before and after)");
    private final JButton fromBaseline = new JButton("From the baseline data");
    private final JButton planAll = new JButton("Plan every characteristic");
    private final JButton plan = new JButton("Plan");
    /** Fields the user typed into (or all, once a plan was asked for): only they show "Enter a value". */
    private final java.util.Set<Field> touched = java.util.EnumSet.noneOf(Field.class);
    private final JPanel numbers = new JPanel(new GridBagLayout());
    private final JLabel resultTitle = Bind.heading("No plan yet");
    private final JTextArea allPlans = new JTextArea(4, 40);
    private JScrollPane allPlansBox;
    private final transient ExecutorService renderer = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "holdpoint-plan-chart");
        t.setDaemon(true);
        return t;
    });
    private final ChartView chart = new ChartView(renderer);
    private boolean updating;

    PlanPanel(StudySession session) {
        super(new BorderLayout());
        this.session = session;
        this.form = session.plan();
        createComponents();
        layoutComponents();
        refreshValues();
        refreshCharacteristics();
        refreshResult();
    }

    private void createComponents() {
        for (Field f : Field.values()) {
            JTextField t = new JTextField(10);
            t.setName("plan." + f.name());
            Runnable refresh = Bind.text(t, () -> form.get(f), v -> {
                touched.add(f);
                form.set(f, v);
            });
            form.addListener(PlanForm.Property.VALUES, e -> refresh.run());
            t.addActionListener(e -> {
                touched.addAll(java.util.List.of(Field.values()));
                form.plan();
            });
            fields.put(f, t);
            JLabel p = Bind.errorLabel();
            p.setName("plan.problem." + f.name());
            problems.put(f, p);
            labels.put(f, Bind.label(f.label(), (char) 0, t));
        }
        fields.get(Field.SD).setToolTipText("Two groups: the sd of single values. Paired: the sd of the differences "
                + "after − before of the same parts.");
        ButtonGroup g = new ButtonGroup();
        g.add(parallel);
        g.add(paired);
        parallel.setMnemonic('T');
        paired.setMnemonic('I');
        parallel.addActionListener(e -> form.setDesign(Design.PARALLEL));
        paired.addActionListener(e -> form.setDesign(Design.PAIRED));
        marginMode.addActionListener(e -> {
            if (!updating) {
                form.setMarginMode((PlanForm.MarginMode) marginMode.getSelectedItem());
            }
        });
        characteristic.setName("plan.characteristic");
        characteristic.addActionListener(e -> {
            if (!updating && characteristic.getSelectedItem() != null) {
                form.setCharacteristic((String) characteristic.getSelectedItem());
            }
        });
        fromBaseline.setName("plan.fromBaseline");
        fromBaseline.setMnemonic('B');
        fromBaseline.setToolTipText("σ = the sd of the before sample; the margin from the criteria when set");
        fromBaseline.addActionListener(e -> form.fromBaseline());
        planAll.setName("plan.all");
        planAll.setMnemonic('E');
        planAll.setToolTipText("Each characteristic with its baseline σ and its criteria margin; the largest n decides");
        planAll.addActionListener(e -> form.planAll());
        plan.setName("plan.run");
        plan.setMnemonic('L');
        plan.addActionListener(e -> {
            // an empty field is a problem once the user asks for a plan, not before anything was typed
            touched.addAll(java.util.List.of(Field.values()));
            form.plan();
            refreshValues();
        });
        allPlans.setEditable(false);
        allPlans.setLineWrap(true);
        allPlans.setWrapStyleWord(true);
        allPlans.setOpaque(false);
        allPlans.setName("plan.allPlans");
        form.addListener(PlanForm.Property.VALUES, e -> {
            refreshValues();
            refreshTitle();
        });
        form.addListener(PlanForm.Property.CHARACTERISTICS, e -> refreshCharacteristics());
        form.addListener(PlanForm.Property.RESULT, e -> refreshResult());
        session.addListener(StudySession.Property.BUSY, e -> refreshEnabled());
    }

    private void layoutComponents() {
        JPanel left = new JPanel(new GridBagLayout());
        left.setBorder(BorderFactory.createEmptyBorder(16, 24, 16, 12));
        GridBagConstraints c = new GridBagConstraints();
        c.anchor = GridBagConstraints.LINE_START;
        c.insets = new Insets(4, 0, 4, 10);
        c.gridx = 0;
        c.gridy = 0;
        c.gridwidth = 3;
        left.add(Bind.heading("How many parts for the trial?"), c);
        c.gridy++;
        left.add(Bind.hint("<html><div style='width:380px'>The smallest number of parts whose exact TOST power "
                + "reaches the target, σ taken as known. Take σ and the margin from the baseline (before) data of "
                + "the current study, or type them.</div></html>"), c);
        c.gridy++;
        JPanel base = new JPanel(new FlowLayout(FlowLayout.LEFT, 0, 0));
        base.add(Bind.label("Characteristic ", 'C', characteristic));
        base.add(characteristic);
        base.add(javax.swing.Box.createHorizontalStrut(8));
        base.add(fromBaseline);
        left.add(base, c);
        c.gridy++;
        left.add(planAll, c);
        c.gridy++;
        left.add(parallel, c);
        c.gridy++;
        left.add(paired, c);
        c.gridwidth = 1;
        c.gridy++;
        c.gridx = 0;
        left.add(Bind.label("Margin typed as", 'M', marginMode), c);
        c.gridx = 1;
        left.add(marginMode, c);
        for (Field f : Field.values()) {
            c.gridy++;
            c.gridx = 0;
            c.fill = GridBagConstraints.NONE;
            left.add(labels.get(f), c);
            c.gridx = 1;
            c.fill = GridBagConstraints.HORIZONTAL;
            left.add(fields.get(f), c);
            c.gridy++;
            c.gridx = 0;
            c.gridwidth = 3;
            c.insets = new Insets(0, 0, 4, 10);
            left.add(problems.get(f), c);
            c.gridwidth = 1;
            c.insets = new Insets(4, 0, 4, 10);
        }
        c.gridy++;
        c.gridx = 1;
        c.fill = GridBagConstraints.NONE;
        left.add(plan, c);
        c.gridy++;
        c.weighty = 1;
        left.add(new JPanel(), c);
        JPanel right = new JPanel(new BorderLayout(0, 8));
        right.setBorder(BorderFactory.createEmptyBorder(16, 12, 16, 24));
        JPanel head = new JPanel(new BorderLayout(0, 6));
        head.add(resultTitle, BorderLayout.NORTH);
        head.add(numbers, BorderLayout.CENTER);
        // every characteristic's plan scrolls in a box of a few lines, so the power curve keeps its room
        allPlansBox = new JScrollPane(allPlans);
        allPlansBox.setBorder(BorderFactory.createEmptyBorder());
        allPlansBox.setPreferredSize(new java.awt.Dimension(300, 150));
        allPlansBox.setVisible(false);
        head.add(allPlansBox, BorderLayout.SOUTH);
        right.add(head, BorderLayout.NORTH);
        right.add(chart, BorderLayout.CENTER);
        JSplitPane split = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, new JScrollPane(left), right);
        split.setResizeWeight(0.0);
        split.setDividerLocation(560);
        split.setBorder(null);
        add(split, BorderLayout.CENTER);
    }

    private void refreshValues() {
        updating = true;
        try {
            marginMode.setSelectedItem(form.marginMode());
            if (form.characteristic() != null) {
                characteristic.setSelectedItem(form.characteristic());
            }
            parallel.setSelected(form.design() == Design.PARALLEL);
            paired.setSelected(form.design() == Design.PAIRED);
            for (Field f : Field.values()) {
                boolean used = form.uses(f);
                fields.get(f).setVisible(used);
                labels.get(f).setVisible(used);
                String p = form.problem(f);
                if (p != null && !touched.contains(f) && form.get(f).isBlank()) {
                    p = null;
                }
                problems.get(f).setText(p == null ? " " : "⚠ " + p);
                problems.get(f).setVisible(used && p != null);
                fields.get(f).setToolTipText(p);
                fields.get(f).putClientProperty("JComponent.outline", p == null ? null : "error");
            }
            labels.get(Field.SD).setText(form.design() == Design.PAIRED ? "sd of the differences σ"
                    : Field.SD.label());
        } finally {
            updating = false;
        }
        revalidate();
        repaint();
    }

    private void refreshCharacteristics() {
        updating = true;
        try {
            characteristic.removeAllItems();
            form.characteristics().forEach(characteristic::addItem);
            if (form.characteristic() != null) {
                characteristic.setSelectedItem(form.characteristic());
            }
        } finally {
            updating = false;
        }
        refreshEnabled();
    }

    private void refreshEnabled() {
        boolean data = !form.characteristics().isEmpty();
        boolean idle = !session.busy();
        fromBaseline.setEnabled(data && idle);
        planAll.setEnabled(data && idle);
        plan.setEnabled(idle);
    }

    private void refreshResult() {
        numbers.removeAll();
        GridBagConstraints c = new GridBagConstraints();
        c.anchor = GridBagConstraints.LINE_START;
        c.insets = new Insets(2, 0, 2, 16);
        c.gridy = 0;
        for (String[] line : form.resultLines()) {
            c.gridx = 0;
            c.weightx = 0;
            numbers.add(new JLabel(line[0]), c);
            c.gridx = 1;
            c.weightx = 1;
            JLabel v = new JLabel(line[1]);
            v.setName("plan.value." + c.gridy);
            v.setFont(v.getFont().deriveFont(Font.BOLD));
            numbers.add(v, c);
            c.gridy++;
        }
        refreshTitle();
        var r = form.result();
        var all = form.allPlans();
        if (all == null) {
            allPlans.setText("");
            allPlans.setVisible(false);
            allPlansBox.setVisible(false);
        } else {
            StringBuilder b = new StringBuilder("Every characteristic (baseline mean and σ, the criteria's margin, "
                    + "sd-growth limit and capability requirement):\n");
            for (var p : all.plans()) {
                b.append("  ").append(p.name()).append(": equivalence ").append(p.plan() != null
                        ? sizeWords(p.plan()) : "not planned (" + p.note() + ")");
                if (p.spread() != null || p.spreadNote() != null) {
                    b.append("; spread ").append(p.spread() != null ? p.spread().nBefore() + " per group"
                            : "not planned (" + p.spreadNote() + ")");
                }
                if (p.capability() != null || p.capabilityNote() != null) {
                    b.append("; capability ").append(p.capability() != null ? p.capability().nAfter() + " after"
                            : "not planned (" + p.capabilityNote() + ")");
                }
                if (p.drivenBy() != null) {
                    b.append(" — decided by ").append(p.drivenBy());
                }
                b.append(p == all.driving() ? "   ← needs the most parts" : "").append('\n');
            }
            allPlans.setText(b.toString().stripTrailing());
            allPlans.setVisible(true);
            allPlansBox.setVisible(true);
            javax.swing.SwingUtilities.invokeLater(() -> allPlans.setCaretPosition(0));
        }
        var curve = form.drivingCurve();
        if (curve != null) {
            // the criterion that decides the size draws its own curve
            chart.show(() -> PowerCurveChart.create(curve.title(), curve.xLabel(), curve.subtitle(), curve.yLabel(),
                    curve.x(), curve.power(), curve.target(), ChartTheme.withDefaults()));
        } else if (r == null) {
            chart.clear("The power curve appears here after planning.");
        } else {
            double[] x = form.curveDifferences();
            double[] y = form.curvePower();
            double target = r.targetPower();
            String title = "Power at " + sizeWords(r) + (form.resultFor().isEmpty() ? "" : " — " + form.resultFor());
            String unit = form.unit();
            chart.show(() -> PowerCurveChart.create(title, unit, x, y, target, ChartTheme.withDefaults()));
        }
        numbers.revalidate();
        numbers.repaint();
    }

    private void refreshTitle() {
        var r = form.result();
        // a heading short enough for the pane; the longer words go into its tip
        resultTitle.setText(r == null ? "No plan yet"
                : "Plan for " + form.resultFor() + (form.stale() ? " (values changed)" : ""));
        resultTitle.setToolTipText(r == null ? "Type the values or take them from the baseline data, then press Plan"
                : "Target power " + Math.round(100 * r.targetPower()) + " %" + (form.stale()
                        ? "; the values changed since: press Plan" : ""));
    }

    private static String sizeWords(org.holdpoint.stats.PlanResult p) {
        return p.design() == Design.PAIRED ? p.n() + " pairs" : p.n() + " before + " + p.nAfter() + " after";
    }

    /** @return the component that gets the focus when the step opens */
    javax.swing.JComponent focusTarget() {
        return fromBaseline.isEnabled() ? fromBaseline : fields.get(Field.ALPHA);
    }
}
