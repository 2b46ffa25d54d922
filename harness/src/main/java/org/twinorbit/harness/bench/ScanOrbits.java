package org.twinorbit.harness.bench;

import java.util.Locale;
import org.twinorbit.harness.run.CaseRunner;
import org.twinorbit.harness.run.RunSchedule;
import org.twinorbit.harness.scan.BreakdownScan;
import org.twinorbit.harness.scan.ModelErrorEvaluator;
import org.twinorbit.harness.scan.ScanCommand;
import org.twinorbit.harness.scan.ScanRequest;
import org.twinorbit.shared.Species;
import picocli.CommandLine;

/**
 * Lists the full-orbit reference runs a scan makes, for the plain-C comparison program in
 * {@code bench/c}: every point's gyrophase ensemble at the reference tolerance and its phase 0
 * again at the 100× tighter one of the self-estimate, with start state, end time and the
 * sampling interval of the dense output. Takes the options of {@code scan} (the proton only;
 * the C program knows the library's dipole, mirror and gradient fields with default parameters).
 *
 * <pre>java -cp harness/target/twinorbit.jar org.twinorbit.harness.bench.ScanOrbits --field dipole ... &gt; orbits.txt</pre>
 *
 * One line per orbit: {@code field rtol t_end_s interval_s x y z (m) ux uy uz (m/s)}.
 */
public final class ScanOrbits {

    private ScanOrbits() {}

    public static void main(String[] args) {
        ScanCommand cmd = new ScanCommand();
        new CommandLine(cmd).parseArgs(args);
        ScanRequest.Built built = cmd.setup();
        BreakdownScan scan = built.scan();
        ModelErrorEvaluator ev = (ModelErrorEvaluator) built.evaluator();
        StringBuilder out = new StringBuilder();
        for (double pitch : scan.pitches()) {
            for (double eps : scan.eps()) {
                double energy = scan.axis().energyEv().applyAsDouble(eps);
                RunSchedule s = ev.schedule(eps, energy, pitch);
                if (s.resolved().species() != Species.PROTON) {
                    throw new IllegalArgumentException("the C comparison knows the proton only");
                }
                double rtol = s.resolved().spec().referenceRtol();
                long samples = CaseRunner.referenceSamples(s.endTime(), s.resolved().gyroPeriod());
                double interval = s.endTime() / samples;
                String field = s.resolved().spec().field();
                for (int k = 0; k < s.x0().length; k++) {
                    line(out, field, rtol, s.endTime(), interval, s.x0()[k], s.u0()[k]);
                }
                line(out, field, Math.max(rtol / 100, 1e-14), s.endTime(), interval, s.x0()[0], s.u0()[0]);
            }
        }
        System.out.print(out);
    }

    private static void line(StringBuilder out, String field, double rtol, double tEnd, double interval, double[] x,
                             double[] u) {
        out.append(String.format(Locale.ROOT, "%s %.17g %.17g %.17g %.17g %.17g %.17g %.17g %.17g %.17g%n", field,
                rtol, tEnd, interval, x[0], x[1], x[2], u[0], u[1], u[2]));
    }
}
