package org.twinorbit.harness.report;

import java.util.Locale;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.AxesChartStyler;

/**
 * Logarithmic axes with tick labels in one style: 1e-3, 1e-2, 1e-1, 1e0, 1e1 at the decades and
 * unlabelled minor ticks at 2…9 times each decade. {@link #range} fits an axis to its data and
 * widens it to whole decades where needed, so that at least two decades are labelled (XChart
 * labels only the decades inside the range: an axis from 0.02 to 0.2 would carry the one label
 * 1e-1).
 *
 * <p>Why a decimal pattern and not a formatting function: XChart 3.8 gives a log axis its log
 * tick positions only while the axis has no formatting function; with one it computes linear
 * ticks across the decades. The pattern is applied by XChart's own log-axis formatter, which by
 * default switches between "0.001" and "1E-4" at 10⁻³ and 10³ and so mixed both styles on one
 * axis.
 */
public final class LogAxes {

    /** One significant digit and the power of ten. */
    static final String PATTERN = "0E0";
    /**
     * The locale of the charts' number symbols: CLDR's English (Australia) writes the exponent
     * with a lower-case e and a plain hyphen-minus (1e-3); most locales write "1E-3". Linear axes
     * of the project have their own formatter and are not affected.
     */
    static final Locale LOCALE = Locale.forLanguageTag("en-AU");

    /** Margin at each end of a log axis, as a fraction of the data's span in decades. */
    static final double MARGIN = 0.04;
    /** Smallest margin at each end of a log axis (decades). */
    static final double MIN_MARGIN = 0.05;

    private LogAxes() {}

    /** Makes the x axis logarithmic with the project's tick labels. */
    public static void x(AxesChartStyler s) {
        s.setXAxisLogarithmic(true);
        s.setXAxisLogarithmicDecadeOnly(true);
        s.setXAxisDecimalPattern(PATTERN);
        s.setLocale(LOCALE);
    }

    /** Makes the y axis logarithmic with the project's tick labels. */
    public static void y(AxesChartStyler s) {
        s.setYAxisLogarithmic(true);
        s.setYAxisLogarithmicDecadeOnly(true);
        s.setYAxisDecimalPattern(PATTERN);
        s.setLocale(LOCALE);
    }

    /**
     * Sets the range of a log axis around the positive values of its series (see
     * {@link #range}); leaves it alone when there is no positive value.
     */
    public static void range(XYChart c, boolean xAxis) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = 0;
        for (XYSeries s : c.getSeriesMap().values()) {
            for (double v : xAxis ? s.getXData() : s.getYData()) {
                if (v > 0 && Double.isFinite(v)) {
                    lo = Math.min(lo, v);
                    hi = Math.max(hi, v);
                }
            }
        }
        range(c.getStyler(), xAxis, lo, hi);
    }

    /**
     * Sets the range of a log axis to [lo, hi] with a margin of {@link #MARGIN} of its span (so
     * that markers at the ends are whole), widened to the whole decades around it when fewer than
     * two decades would lie inside (XChart labels only the decades within the range). Leaves the
     * axis alone unless 0 < lo ≤ hi < ∞.
     */
    public static void range(AxesChartStyler s, boolean xAxis, double lo, double hi) {
        if (!(lo > 0 && hi >= lo && Double.isFinite(hi))) {
            return;
        }
        double a = Math.log10(lo);
        double b = Math.log10(hi);
        double pad = Math.max(MARGIN * (b - a), MIN_MARGIN);
        a -= pad;
        b += pad;
        if (Math.floor(b) - Math.ceil(a) < 1) {
            a = Math.floor(Math.log10(lo) + 1e-9);
            b = Math.max(Math.ceil(Math.log10(hi) - 1e-9), a + 1);
        }
        if (xAxis) {
            s.setXAxisMin(Math.pow(10, a)).setXAxisMax(Math.pow(10, b));
        } else {
            s.setYAxisMin(Math.pow(10, a)).setYAxisMax(Math.pow(10, b));
        }
    }
}
