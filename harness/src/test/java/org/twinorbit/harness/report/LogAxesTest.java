package org.twinorbit.harness.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;

/** The range of a log axis: fitted to the data with a margin, widened to whole decades only where needed. */
class LogAxesTest {

    private static XYChart chart() {
        XYChart c = new XYChartBuilder().width(400).height(300).build();
        LogAxes.x(c.getStyler());
        return c;
    }

    @Test
    void anAxisWithinOneDecadeIsWidenedToTheDecadesAroundIt() {
        // 0.02 to 0.2 holds the one decade 0.1: XChart would label nothing else
        XYChart c = chart();
        LogAxes.range(c.getStyler(), true, 0.02, 0.2);
        assertEquals(0.01, c.getStyler().getXAxisMin(), 1e-15);
        assertEquals(1, c.getStyler().getXAxisMax(), 1e-12);
        // within one decade (0.2 to 0.5): at least one decade apart
        LogAxes.range(c.getStyler(), true, 0.2, 0.5);
        assertEquals(0.1, c.getStyler().getXAxisMin(), 1e-15);
        assertEquals(1, c.getStyler().getXAxisMax(), 1e-12);
    }

    @Test
    void anAxisOverSeveralDecadesKeepsItsDataRangeWithAMargin() {
        // 80 to 10240 holds 1e2, 1e3, 1e4: no empty decades added, a margin of 4 % of the span
        XYChart c = chart();
        LogAxes.range(c.getStyler(), true, 80, 10240);
        double span = Math.log10(10240 / 80.0);
        assertEquals(Math.log10(80) - 0.04 * span, Math.log10(c.getStyler().getXAxisMin()), 1e-12);
        assertEquals(Math.log10(10240) + 0.04 * span, Math.log10(c.getStyler().getXAxisMax()), 1e-12);
    }
}
