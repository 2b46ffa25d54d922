package org.twinorbit.harness.scan;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import org.twinorbit.harness.Format;

/**
 * The one-line answers of a scan: per pitch angle, and over all of them, the largest ε (and
 * energy) below which the guiding-center model keeps every thresholded metric within its
 * tolerance, and which metric limits it. A pitch lost at every point (a loss cone) gets no
 * limit; metrics that do not apply (no bounce, no drift) do not count.
 */
public final class ScanAnswer {

    private ScanAnswer() {}

    /** A limit: ε* (NaN when none inside the range), the energy there (eV, NaN when fixed) and why. */
    record Limit(double epsStar, double energyEv, String because, boolean atStart, boolean lost) {}

    /** One line of answers: a pitch angle (degrees) of one charge sign ({@link ChargeSigns}). */
    private record Line(int sign, double pitchDeg) {}

    /**
     * The lines: one per pitch (per charge sign and pitch with {@code --charge-signs both}), then
     * "overall" when there are several, naming the limiting pitch (and sign).
     */
    public static List<String> lines(ScanResult r) {
        Set<Line> lines = new LinkedHashSet<>();
        r.thresholds().forEach(t -> lines.add(new Line(t.chargeSign(), t.pitchDeg())));
        String species = String.valueOf(r.settings().get("species"));
        double hiEps = ((Number) r.settings().get("eps_max")).doubleValue();
        boolean energies = r.axis().variesEnergy();
        List<String> out = new ArrayList<>();
        Limit overall = null;
        Line overallLine = null;
        for (Line line : lines) {
            Limit l = limit(r, line.pitchDeg(), line.sign());
            out.add(ChargeSigns.label(species, line.sign(), line.pitchDeg()) + ": " + describe(l, hiEps, r, energies));
            if (!l.lost() && (overall == null || rank(l) < rank(overall))) {
                overall = l;
                overallLine = line;
            }
        }
        if (lines.size() > 1) {
            out.add("overall: " + (overall == null ? "every pitch is lost at every point (loss cone)"
                    : describe(overall, hiEps, r, energies) + ", at " + (overallLine.sign() == ChargeSigns.GIVEN
                    ? "" : (overallLine.sign() < 0 ? species + " (-q)" : species) + " ")
                    + "pitch " + Format.number(overallLine.pitchDeg()) + " deg"));
        }
        return out;
    }

    /** Smaller is more limiting: exceeded at start first, then the smallest ε*, then none. */
    private static double rank(Limit l) {
        return l.atStart() ? -1 : Double.isNaN(l.epsStar()) ? Double.POSITIVE_INFINITY : l.epsStar();
    }

    static Limit limit(ScanResult r, double pitch, int sign) {
        Limit best = new Limit(Double.NaN, Double.NaN, null, false, false);
        boolean allLost = true;
        boolean any = false;
        for (Threshold t : r.thresholds()) {
            if (t.pitchDeg() != pitch || t.chargeSign() != sign) {
                continue;
            }
            ThresholdOutcome o = t.outcome();
            if (o == ThresholdOutcome.NO_DATA) {
                continue;
            }
            any = true;
            // class change compares the two models' classes, so a loss cone never makes it "lost"
            allLost &= o == ThresholdOutcome.LOST || t.metric() == ScanMetric.CLASS_CHANGE;
            String name = t.metric().key();
            if (o == ThresholdOutcome.EXCEEDED_AT_START || o == ThresholdOutcome.EXCEEDED_ONCE_MEASURED) {
                if (!best.atStart()) {
                    best = new Limit(Double.NaN, Double.NaN, name, true, false);
                }
            } else if (o.hasEpsStar() && !best.atStart() && !(t.epsStar() >= best.epsStar())) {
                best = new Limit(t.epsStar(), t.energyEvStar(), o == ThresholdOutcome.LOST_ABOVE
                        ? "lost by both models from there on" : name, false, false);
            }
        }
        return any && allLost ? new Limit(Double.NaN, Double.NaN, null, false, true) : best;
    }

    private static String describe(Limit l, double hiEps, ScanResult r, boolean energies) {
        if (l.lost()) {
            return "lost by both models at every point (a loss cone): no limit applies";
        }
        if (l.atStart()) {
            return "not within tolerance even at the smallest eps scanned (" + l.because() + ")";
        }
        if (Double.isNaN(l.epsStar())) {
            return "every metric within tolerance over the whole range, up to eps = " + Format.number(hiEps)
                    + (energies ? " (" + Format.energy(r.axis().energyEv().applyAsDouble(hiEps)) + ")" : "");
        }
        return "guiding centers keep every metric within tolerance below eps = " + Format.number(l.epsStar())
                + (energies && !Double.isNaN(l.energyEv()) ? ", " + Format.energy(l.energyEv()) : "")
                + " (limited by " + l.because() + ")";
    }
}
