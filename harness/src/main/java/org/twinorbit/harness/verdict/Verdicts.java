package org.twinorbit.harness.verdict;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.twinorbit.harness.Format;
import org.twinorbit.harness.run.CaseResult;
import org.twinorbit.harness.run.Diagnostics;
import org.twinorbit.harness.run.ReferenceSummary;
import org.twinorbit.harness.run.ResultRow;

/**
 * Verdicts that need no baseline: facts that hold for any correct scheme, read off each
 * integrator row of a case ({@link Check}). The model row is a measurement of the
 * guiding-center approximation, judged by scans against tolerances, and gets none.
 */
public final class Verdicts {

    /** A stray from the reference of half of μ or of the speed: the orbit is no longer tracked. */
    public static final double RUNAWAY_LIMIT = 0.5;
    /** Largest accepted difference between measured and declared order. */
    public static final double ORDER_TOLERANCE = 0.3;
    /** Largest difference of the two finest local orders of a sweep in the asymptotic regime. */
    public static final double ASYMPTOTIC_SPREAD = 0.3;
    /**
     * γ − 1 above which a scheme not declared relativistic is not judged on order and runaway:
     * its reference solves other equations, so its error saturates at the relativistic
     * difference (a correct non-relativistic Boris measures order 0 there).
     */
    public static final double RELATIVISTIC_LIMIT = 1e-9;
    /**
     * Second-half over first-half largest energy error above which the error grows secularly:
     * linear growth from zero gives 2, a bounded oscillation about 1, round-off's random walk
     * sqrt(2) (which the floor below keeps out).
     */
    public static final double TREND_RATIO = 1.5;
    /** Energy errors (of K0) below this are round-off, whatever their trend. */
    public static final double ENERGY_FLOOR = 1e-12;
    /** The reference must be this many times more accurate than the integrator it judges. */
    public static final double REFERENCE_FACTOR = 10;
    /** Position errors (ρ0) below this are round-off, where no reference can be 10× better. */
    public static final double ROUND_OFF_RHO = 1e-9;

    private Verdicts() {}

    /** One verdict per integrator row of the case, in row order. */
    public static List<RowVerdict> judge(CaseResult r) {
        List<RowVerdict> out = new ArrayList<>();
        for (ResultRow row : r.rows()) {
            if (row.errorKind().equals("discretisation")) {
                out.add(new RowVerdict(r.resolved().spec().name(), row.integrator(), findings(row, r)));
            }
        }
        return out;
    }

    static List<Finding> findings(ResultRow row, CaseResult r) {
        boolean fullOrbit = row.model().equals("full-orbit");
        Diagnostics d = row.diagnostics();
        int declared = d.declaredOrder();
        Set<String> properties = d.properties();
        List<Finding> f = new ArrayList<>();
        if (d.failure() != null) {
            f.add(new Finding(Check.STABLE, true, "failed (the integrator threw " + d.failure() + ")", false));
        } else if (!row.status().equals("ok") && !row.status().equals("lost")) {
            f.add(new Finding(Check.STABLE, true, row.status() + " at "
                    + Format.number(row.statusTime() / r.resolved().gyroPeriod()) + " Tc", false));
        }
        if (row.classAgreement() < 1) {
            // a warning: near a class boundary (a mirror point at the very end of a short run,
            // the edge of a loss cone) a correct scheme can land on the other side
            f.add(new Finding(Check.CLASS, false, row.orbitClass() + ": differs from the reference's in "
                    + Math.round(100 * (1 - row.classAgreement())) + "% of phases", false));
        }
        boolean sameEquations = properties.contains("relativistic") || !fullOrbit
                || r.resolved().gamma() - 1 <= RELATIVISTIC_LIMIT;
        if (sameEquations && d.runaway() > RUNAWAY_LIMIT) {
            f.add(new Finding(Check.RUNAWAY, true, (fullOrbit ? "<mu> or <v||>" : "v||") + " strays by "
                    + Format.number(d.runaway()) + " of its scale from the reference's", false));
        }
        if (sameEquations) {
            order(row, declared, d).ifPresent(f::add);
        }
        boolean reversible = properties.contains("time-reversible") || properties.contains("volume-preserving");
        if (reversible && d.energySecondHalf() > ENERGY_FLOOR
                && d.energySecondHalf() > TREND_RATIO * d.energyFirstHalf()) {
            f.add(new Finding(Check.ENERGY_TREND, true, "declared " + String.join("/", properties.stream()
                    .filter(p -> p.equals("time-reversible") || p.equals("volume-preserving")).sorted().toList())
                    + ", but its energy error grows: " + Format.number(d.energyFirstHalf()) + " in the first half, "
                    + Format.number(d.energySecondHalf()) + " in the second", false));
        }
        referenceMargin(row, r, fullOrbit).ifPresent(f::add);
        return f;
    }

    /**
     * Judges the finest local order of the sweep, which is the closest to the asymptotic one:
     * when the two finest local orders agree within {@link #ASYMPTOTIC_SPREAD} (the sweep has
     * reached the asymptotic regime), a finest order more than {@link #ORDER_TOLERANCE} from the
     * declared one fails; otherwise the order is not measurable here, a warning.
     */
    private static java.util.Optional<Finding> order(ResultRow row, int declared, Diagnostics d) {
        double[] local = d.localOrders();
        if (local.length < 2 || Double.isNaN(row.order())) {
            return java.util.Optional.empty();
        }
        double finest = local[local.length - 1];
        String text = String.format(Locale.ROOT, "local orders %s (fit %.2f), declared %d",
                String.join(", ", Arrays.stream(local).mapToObj(x -> String.format(Locale.ROOT, "%.2f", x)).toList()),
                row.order(), declared);
        if (!(Math.abs(finest - local[local.length - 2]) <= ASYMPTOTIC_SPREAD)) {
            return java.util.Optional.of(new Finding(Check.ORDER, false, text + "; not in the asymptotic regime", false));
        }
        if (Math.abs(finest - declared) > ORDER_TOLERANCE) {
            return java.util.Optional.of(new Finding(Check.ORDER, true, text, false));
        }
        return java.util.Optional.empty();
    }

    /** Warns when the reference's self-estimated error is not {@link #REFERENCE_FACTOR}× below the row's. */
    private static java.util.Optional<Finding> referenceMargin(ResultRow row, CaseResult r, boolean fullOrbit) {
        String model = fullOrbit ? "full-orbit" : "guiding-center";
        double self = r.references().stream().filter(s -> s.model().equals(model))
                .mapToDouble(ReferenceSummary::selfErrorRho).findFirst().orElse(Double.NaN);
        double own = Math.abs(row.metric("position_error_rho").worst());
        // below 1e-9 rho0 both are round-off of positions far from the origin
        if (self > 0 && own > ROUND_OFF_RHO && REFERENCE_FACTOR * self > own) {
            return java.util.Optional.of(new Finding(Check.REFERENCE_MARGIN, false, "the " + model
                    + " reference's own error " + Format.number(self) + " rho0 is not 10x below the row's "
                    + Format.number(own) + " rho0", false));
        }
        return java.util.Optional.empty();
    }
}
