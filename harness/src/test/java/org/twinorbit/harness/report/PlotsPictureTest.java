package org.twinorbit.harness.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.Styler;
import org.twinorbit.harness.cases.CaseSpec;
import org.twinorbit.harness.metrics.Track;
import org.twinorbit.harness.run.CaseResult;
import org.twinorbit.harness.run.TestCases;

/**
 * The plots of a case as a reader sees them: each type renders at its size, is not blank and has
 * its series; the orbit overlay shows the integrators against the references, in the plane at
 * 1:1 with readable units; pushers that coincide stay apart; the convergence plot has its slope
 * guides, the reference's own error and says what it measures.
 */
class PlotsPictureTest {

    private static CaseResult mirror;

    @BeforeAll
    static void run() {
        CaseSpec s = TestCases.spec("mirror", "boris,vay", "gc-rk4");
        s.eps = 0.05;
        s.phases = 2;
        s.duration = 20.0;
        mirror = TestCases.run(s);
    }

    @Test
    void everyCasePlotRendersWithItsSeries() {
        PictureChecks.check(Plots.mu(mirror), 1000, 560, List.of(Plots.MU_REFERENCE, "boris", "vay"));
        PictureChecks.check(Plots.energy(mirror), 1000, 560, List.of(Plots.ENERGY_REFERENCE, "boris", "vay", "gc-rk4"));
        PictureChecks.check(Plots.orbit(mirror), 1000, 560, List.of("full-orbit reference, gyro-averaged",
                "guiding-center reference", "boris, gyro-averaged", "vay, gyro-averaged", "gc-rk4"));
        XYChart conv = Plots.convergence(mirror);
        PictureChecks.check(conv, 1000, 560, List.of(Plots.guideName("full-orbit", 2), Plots.guideName("full-orbit", 4),
                Plots.guideName("guiding-center", 4), Plots.floorName("full-orbit")));
        for (String name : List.of("boris (order", "vay (order", "gc-rk4 (order")) {
            assertTrue(conv.getSeriesMap().keySet().stream().anyMatch(k -> k.startsWith(name)), name);
        }
    }

    @Test
    void logAxesLabelTheirDecadesInOneStyle() {
        // the issue: "1E-4" beside "0.001" on one axis
        PictureChecks.logTicks(Plots.mu(mirror), false, true);
        PictureChecks.logTicks(Plots.energy(mirror), false, true);
        PictureChecks.logTicks(Plots.convergence(mirror), true, true);
    }

    @Test
    void theOrbitOverlayShowsTheIntegratorsNotOnlyTheReferences() {
        XYChart c = Plots.orbit(mirror);
        // the pusher's own gyro-averaged centers, point by point: not the reference's (issue:
        // a disagreement of many gyroradii was invisible when only references were drawn)
        XYSeries boris = c.getSeriesMap().get("boris, gyro-averaged");
        XYSeries ref = c.getSeriesMap().get("full-orbit reference, gyro-averaged");
        assertFalse(java.util.Arrays.equals(boris.getYData(), ref.getYData()), "pusher drawn as the reference");
        assertEquals(Styler.LegendPosition.OutsideE, c.getStyler().getLegendPosition(), "legend off the data");
    }

    @Test
    void coincidingPushersStayDistinguishable() {
        // Boris and Vay give the same μ to ~1e-9 here: colour, dash, width and marker shape all
        // differ, and their markers sit at different samples
        XYChart c = Plots.mu(mirror);
        XYSeries a = c.getSeriesMap().get("boris");
        XYSeries b = c.getSeriesMap().get("vay");
        assertNotEquals(a.getLineColor(), b.getLineColor());
        assertFalse(java.util.Arrays.equals(a.getLineStyle().getDashArray(), b.getLineStyle().getDashArray()));
        assertTrue(a.getLineWidth() > b.getLineWidth(), "the one drawn first is wider, so the later shows on it");
        XYSeries ma = c.getSeriesMap().get("boris markers");
        XYSeries mb = c.getSeriesMap().get("vay markers");
        assertNotEquals(ma.getMarker().getClass(), mb.getMarker().getClass());
        assertNotEquals(ma.getXData()[0], mb.getXData()[0], "markers shifted against each other");
        assertFalse(ma.isShowInLegend());
    }

    @Test
    void convergenceHasSlopeGuidesTheReferenceFloorAndItsSpan() {
        XYChart c = Plots.convergence(mirror);
        for (int order : new int[] {2, 4}) {
            XYSeries g = c.getSeriesMap().get(Plots.guideName("full-orbit", order));
            double slope = Math.log(g.getYData()[1] / g.getYData()[0]) / Math.log(g.getXData()[1] / g.getXData()[0]);
            assertEquals(order, slope, 1e-9, "guide of order " + order);
        }
        // Boris and Vay have the same convergence points: nested marker shapes of different size
        XYSeries boris = c.getSeriesMap().values().stream().filter(x -> x.getName().startsWith("boris (")).findFirst()
                .orElseThrow();
        XYSeries vay = c.getSeriesMap().values().stream().filter(x -> x.getName().startsWith("vay (")).findFirst()
                .orElseThrow();
        assertNotEquals(((Plots.Scaled) boris.getMarker()).shape.getClass(), ((Plots.Scaled) vay.getMarker()).shape.getClass());
        XYSeries floor = c.getSeriesMap().get(Plots.floorName("full-orbit"));
        assertEquals(mirror.convergence().fullOrbitReferenceError(), floor.getYData()[0]);
        assertTrue(mirror.convergence().fullOrbitReferenceError() > 0);
        // the full-orbit sweep runs 4 initial gyroperiods (CaseRunner.CONVERGENCE_GYRO), the
        // guiding-center sweep the whole run
        assertTrue(c.getTitle().contains("after 4 Tc (full orbit)"), c.getTitle());
        assertTrue(c.getTitle().contains("20 Tc (guiding center)"), c.getTitle());
        assertTrue(c.getXAxisTitle().contains("dt, dt/2, dt/4, dt/8"), c.getXAxisTitle());
    }

    /**
     * In the crossed field gc-rk4 is exact (uniform E×B drift, Northrop 1963): its errors sit at
     * round-off, its order is not measurable, and it gets no slope guide (a guide decades below
     * its points stretched the axis before).
     */
    @Test
    void noSlopeGuideBesideErrorsAtRoundOff() {
        CaseSpec s = TestCases.spec("crossed", "boris", "gc-rk4");
        s.phases = 1;
        s.duration = 10.0;
        CaseResult r = TestCases.run(s);
        assertTrue(r.rows().stream().anyMatch(x -> x.integrator().equals("gc-rk4") && Double.isNaN(x.order())),
                "gc-rk4's order in the crossed field is not measurable");
        XYChart c = Plots.convergence(r);
        assertTrue(c.getSeriesMap().containsKey(Plots.guideName("full-orbit", 2)));
        assertFalse(c.getSeriesMap().containsKey(Plots.guideName("guiding-center", 2)), c.getSeriesMap().keySet().toString());
    }

    @Test
    void planePanelsAreOneToOneInReadableUnits() {
        // the tokamak's R-z panel: a banana must not be squashed
        CaseSpec s = TestCases.spec("tokamak", "boris", "gc-rk4");
        s.phases = 1;
        s.duration = 40.0;
        s.pitch = 80.0;
        CaseResult r = TestCases.run(s);
        XYChart c = Plots.orbit(r);
        PictureChecks.check(c, 1000, 560, List.of("boris, gyro-averaged", "gc-rk4"));
        // after rendering, one unit is as many pixels along R as along z
        double x0 = c.getStyler().getXAxisMin();
        double x1 = c.getStyler().getXAxisMax();
        double y0 = c.getStyler().getYAxisMin();
        double y1 = c.getStyler().getYAxisMax();
        double px = Math.abs(c.getScreenXFromChart(x1) - c.getScreenXFromChart(x0)) / (x1 - x0);
        double py = Math.abs(c.getScreenYFromChart(y1) - c.getScreenYFromChart(y0)) / (y1 - y0);
        assertEquals(1.0, px / py, 0.02, "pixels per unit along R over z");
        assertEquals("R (m)", c.getXAxisTitle());
        assertEquals("z (m)", c.getYAxisTitle());
    }

    @Test
    void lengthsGetAUnitThatKeepsTicksShort() {
        // the dipole's L = 5 Earth radii: 3.2e7 m would read "3.2E7" in metres
        Track far = new Track(0);
        far.add(0, 3.19e7, 0, -2e6, 0);
        far.add(1, 3.19e7, 0, 2e6, 0);
        assertEquals("Mm", Plots.Unit.of(List.of(far), "z").name());
        Track near = new Track(0);
        near.add(0, 0, 0, -0.33, 0);
        near.add(1, 0, 0, 0.33, 0);
        assertEquals("m", Plots.Unit.of(List.of(near), "z").name());
        Track drift = new Track(0);
        drift.add(0, 3.19e7, 0, 0, 0);
        drift.add(1, 3.19e7 + 2e4, 0, 0, 0);
        assertEquals("Mm", Plots.Unit.of(List.of(drift), "x").name(), "a 20 km drift far out: 31.9 to 31.92 Mm");
        assertEquals("31.92", Plots.plain(31.92 + 1e-14), "round-off of the tick position is not shown");
        // tick labels: no exponent, no bare leading point
        for (double v : new double[] {0.05, -0.35, 0.3, 31.9, 31.905, 1.5e-3, 2.0}) {
            String t = Plots.plain(v);
            assertFalse(t.contains("E") || t.startsWith(".") || t.startsWith("-."), t);
            assertEquals(v, Double.parseDouble(t), 1e-12 * Math.abs(v), t);
        }
        assertEquals("0.05", Plots.plain(0.05));
        assertEquals("0", Plots.plain(-0.0));
    }
}
