package org.twinorbit.harness.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import org.junit.jupiter.api.Test;
import org.twinorbit.harness.TwinorbitCommand;
import org.twinorbit.harness.cases.CaseSpec;
import org.twinorbit.harness.run.CaseResult;
import org.twinorbit.harness.run.TestCases;

/**
 * The run table says what its columns are: the center's position error is named so, the
 * particle's stands beside it, the reference's own μ change beside the row's, and the legend
 * under the table (terminal and run.md) says that the phase error is φ/φ_ref − 1.
 */
class RunTableLegendTest {

    @Test
    void headingNamesTheCenterAndTheParticleAndTheReferenceRipple() {
        assertTrue(ResultTables.HEADER.contains("center pos err/rho"));
        assertTrue(ResultTables.HEADER.contains("particle pos err/rho"));
        assertTrue(!ResultTables.HEADER.contains("pos err/rho"), "the bare name said nothing about which position");
        int mu = ResultTables.HEADER.indexOf("mu change");
        assertEquals("ref mu change", ResultTables.HEADER.get(mu + 1), "beside the row's own mu change");
        assertTrue(Legend.TEXT.contains("phase err: phi/phi_ref - 1"), Legend.TEXT);
        assertTrue(Legend.TEXT.contains("center pos err/rho: error of the gyro-averaged center"), Legend.TEXT);
        assertTrue(Legend.TEXT.contains("ref mu change:"), Legend.TEXT);
    }

    @Test
    void legendIsPrintedUnderTheTableInRunMdAndOnTheTerminal() {
        CaseSpec s = TestCases.spec("uniform", "boris", "gc-rk4");
        s.phases = 1;
        s.duration = 5.0;
        CaseResult r = TestCases.run(s);
        String md = RunReport.markdown(r, "run-");
        int table = md.indexOf("| integrator |");
        int model = md.lastIndexOf("| gc-reference |");
        int legend = md.indexOf("phase err: phi/phi_ref - 1");
        assertTrue(table >= 0 && model > table && legend > model, md);

        StringWriter out = new StringWriter();
        var cl = TwinorbitCommand.commandLine();
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(new StringWriter()));
        int code = cl.execute("run", "--field", "uniform", "--phases", "1", "--duration", "5", "--pushers", "boris", "-q");
        assertEquals(0, code, out.toString());
        String text = out.toString();
        int heading = text.indexOf("integrator ");
        int lastRow = text.indexOf("gc-reference ");
        int under = text.indexOf("phase err: phi/phi_ref - 1");
        assertTrue(heading >= 0 && lastRow > heading && under > lastRow, text);
        assertTrue(text.indexOf("verdicts:") > under, "verdicts after the legend: " + text);
    }
}
