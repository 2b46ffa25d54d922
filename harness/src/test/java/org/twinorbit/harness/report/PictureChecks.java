package org.twinorbit.harness.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.util.Collection;
import org.knowm.xchart.BitmapEncoder;
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
}
