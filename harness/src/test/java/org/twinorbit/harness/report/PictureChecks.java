package org.twinorbit.harness.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.util.Collection;
import java.util.List;
import org.knowm.xchart.BitmapEncoder;
import org.knowm.xchart.internal.chartpart.Axis;
import org.knowm.xchart.internal.chartpart.AxisTickCalculator;
import org.knowm.xchart.internal.chartpart.Chart;

/**
 * What every picture must pass: rendered at the chart's size, not blank, with the series it is
 * meant to show. Shared by the picture tests of the report, scan and precision packages.
 */
public final class PictureChecks {

    private PictureChecks() {}

    /**
     * Renders the chart and checks its size, that it is not blank (the luminance varies and
     * enough pixels are coloured: axes, grid and text are grey, so colour means data) and that
     * every named series exists.
     *
     * @return the rendered image
     */
    public static BufferedImage check(Chart<?, ?> c, int width, int height, Collection<String> series) {
        for (String s : series) {
            assertTrue(c.getSeriesMap().containsKey(s), () -> "no series '" + s + "' in '" + c.getTitle() + "'; has "
                    + c.getSeriesMap().keySet());
        }
        BufferedImage img = BitmapEncoder.getBufferedImage(c);
        assertEquals(width, img.getWidth(), c.getTitle());
        assertEquals(height, img.getHeight(), c.getTitle());
        double sum = 0;
        double sumSq = 0;
        long coloured = 0;
        for (int y = 0; y < img.getHeight(); y++) {
            for (int x = 0; x < img.getWidth(); x++) {
                int rgb = img.getRGB(x, y);
                int r = (rgb >> 16) & 0xff;
                int g = (rgb >> 8) & 0xff;
                int b = rgb & 0xff;
                double lum = 0.299 * r + 0.587 * g + 0.114 * b;
                sum += lum;
                sumSq += lum * lum;
                if (Math.max(r, Math.max(g, b)) - Math.min(r, Math.min(g, b)) > 60) {
                    coloured++;
                }
            }
        }
        long n = (long) img.getWidth() * img.getHeight();
        double variance = sumSq / n - (sum / n) * (sum / n);
        // a white image has variance 0; the frame, grid and labels alone give a few hundred
        assertTrue(variance > 100, () -> c.getTitle() + ": luminance variance " + variance);
        // one scatter marker of the safe-use map is ~60 coloured pixels; grey axes and text give none
        long minColoured = 40;
        long got = coloured;
        assertTrue(got > minColoured, () -> c.getTitle() + ": only " + got + " coloured pixels (no data drawn?)");
        return img;
    }

    /** One decade label of a log axis: 1e-3, 1e0, 1e2. */
    private static final java.util.regex.Pattern DECADE = java.util.regex.Pattern.compile("1e(0|-?[1-9][0-9]*)");
    /** A multiple of a decade, labelled on short log axes: 2e-3. */
    private static final java.util.regex.Pattern MULTIPLE = java.util.regex.Pattern.compile("[2-9]e(0|-?[1-9][0-9]*)");

    /**
     * Renders the chart within a few seconds (a custom formatter on a log axis once made XChart
     * lay out linear ticks across many decades and hang) and checks that the named log axes
     * label their ticks in one style, 1e-3, 1e-2, …, each label at its own value, at least two
     * decades labelled or every tick labelled, and that minor ticks lie between the decades.
     *
     * @param x check the x axis (log)
     * @param y check the y axis (log)
     */
    public static void logTicks(Chart<?, ?> c, boolean x, boolean y) {
        assertTimeoutPreemptively(java.time.Duration.ofSeconds(20), () -> BitmapEncoder.getBufferedImage(c),
                () -> c.getTitle() + ": rendering hangs");
        if (x) {
            logAxis(c, axis(c, "getXAxis"), "x");
        }
        if (y) {
            logAxis(c, axis(c, "getYAxis"), "y");
        }
    }

    private static void logAxis(Chart<?, ?> c, AxisTickCalculator t, String name) {
        List<String> labels = t.getTickLabels();
        List<String> shown = labels.stream().filter(java.util.Objects::nonNull).toList();
        String where = c.getTitle() + ", " + name + " axis, labels " + labels;
        assertTrue(shown.size() >= 2, where);
        long decades = shown.stream().filter(l -> DECADE.matcher(l).matches()).count();
        for (String l : shown) {
            assertTrue(DECADE.matcher(l).matches() || MULTIPLE.matcher(l).matches(), () -> "'" + l + "' in " + where);
            // the label says the value at its tick: decades and multiples alike
            double v = Double.parseDouble(l);
            assertTrue(v > 0, where);
        }
        // two decades labelled, or a short axis with every tick labelled
        assertTrue(decades >= 2 || shown.size() == labels.size(), where);
        // minor ticks at 2…9 times a decade beside the decades
        assertTrue(labels.size() > decades, where);
        assertEquals(labels.size(), t.getTickLocations().size(), where);
    }

    /** The axis' tick calculator of the last rendering (XChart keeps it internal). */
    private static AxisTickCalculator axis(Chart<?, ?> c, String getter) {
        try {
            java.lang.reflect.Field f = Chart.class.getDeclaredField("axisPair");
            f.setAccessible(true);
            Object pair = f.get(c);
            java.lang.reflect.Method m = pair.getClass().getDeclaredMethod(getter);
            m.setAccessible(true);
            Axis<?, ?> a = (Axis<?, ?>) m.invoke(pair);
            return a.getAxisTickCalculator();
        } catch (ReflectiveOperationException e) {
            throw new AssertionError("XChart's axes changed: " + e, e);
        }
    }
}
