package org.holdpoint.workflow;

import java.nio.file.Path;
import java.util.List;
import org.holdpoint.chart.ChartTheme;
import org.holdpoint.chart.PowerCurveChart;
import org.holdpoint.stats.PlanResult;
import org.holdpoint.stats.PowerPoint;

/** Draws the power curve of a plan (power against the true difference, target marked) to a PNG file. */
public final class PlanChartUseCase {
    private PlanChartUseCase() {
    }

    /**
     * Writes the power curve atomically.
     *
     * @param plan   the plan with its power table
     * @param unit   the unit of the difference, or null
     * @param target the PNG file
     * @return the file written
     */
    public static Path write(PlanResult plan, String unit, Path target) {
        List<PowerPoint> table = plan.powerTable();
        double[] d = new double[table.size()];
        double[] p = new double[table.size()];
        for (int i = 0; i < d.length; i++) {
            d[i] = table.get(i).difference();
            p[i] = table.get(i).power();
        }
        double goal = plan.targetPower() == null ? plan.achievedPower() : plan.targetPower();
        ChartTheme theme = ChartTheme.withDefaults();
        var chart = PowerCurveChart.create("Power of the equivalence test at n = " + plan.n()
                + (plan.nAfter() != plan.n() ? " / " + plan.nAfter() : ""), unit, d, p, goal, theme);
        return org.holdpoint.chart.ChartExport.writePng(chart, theme.width(), theme.standardHeight(), theme.scale(),
                target);
    }
}
