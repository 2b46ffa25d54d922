package org.twinorbit.harness.scan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.twinorbit.harness.Format;
import org.twinorbit.harness.TestCommandLine;
import org.twinorbit.shared.Constants;
import org.twinorbit.shared.Species;

/**
 * Scans that answer in energy. The ε range from --energy-min/--energy-max follows from
 * ρ0 = p/(|q| B0) and p c = sqrt(K² + 2 K m c²) (relativistic kinematics; common practice),
 * with B0 = 0.5 T and L = 1 m at the mirror's default start; energies accept units; a pitch
 * inside the loss cone (sin²α < 1/Rm = 1/4, α < 30°: common practice) is named as such in the
 * answer, never given a limit.
 */
class EnergyRangeScanTest {

    @TempDir
    Path tmp;

    private static double epsOf(double kineticEv) {
        Species p = Species.PROTON;
        double k = kineticEv * Constants.E;
        double mc2 = p.mass() * Constants.C * Constants.C;
        double momentum = Math.sqrt(k * k + 2 * k * mc2) / Constants.C;
        return momentum / (p.charge() * 0.5) / 1.0;
    }

    @Test
    void energyRangeSetsTheEpsRangeAndTheAnswerNamesTheLossCone() throws IOException {
        String out = TestCommandLine.succeeded("scan", "--field", "mirror", "--energy-min", "5keV", "--energy-max",
                "0.3MeV", "--points", "4", "--pitch", "20,60", "--phases", "4", "--out", tmp.toString(), "--quiet");
        JsonNode doc = new ObjectMapper().readTree(tmp.resolve("scan.json").toFile());
        JsonNode s = doc.get("scan");
        assertEquals(epsOf(5e3), s.get("eps_min").asDouble(), 1e-9 * epsOf(5e3));
        assertEquals(epsOf(3e5), s.get("eps_max").asDouble(), 1e-9 * epsOf(3e5));
        assertTrue(out.contains("pitch 20 deg: lost by both models at every point (a loss cone)"), out);
        assertTrue(out.contains("pitch 60 deg: ") && out.contains("overall: "), out);
        assertTrue(out.contains("keV") || out.contains("MeV"), out);
    }

    @Test
    void energiesAreReadWithUnitsAndPrintedForPeople() {
        assertEquals(2e4, Format.parseEnergy("20keV", "--energy"), 1e-9);
        assertEquals(1.5e6, Format.parseEnergy("1.5 MeV", "--energy"), 1e-6);
        assertEquals(3e9, Format.parseEnergy("3GeV", "--energy"), 1e-3);
        assertEquals(250.0, Format.parseEnergy("250", "--energy"), 0);
        assertEquals("34.6 keV", Format.energy(34_567));
        assertEquals("1.50 MeV", Format.energy(1.5e6));
        assertEquals("250 eV", Format.energy(250));
    }

    @Test
    void conflictingOrMeaninglessRangesAreRefused() {
        TestCommandLine.Outcome both = TestCommandLine.exec("scan", "--field", "mirror", "--energy-min", "5keV",
                "--eps-min", "0.01", "--out", tmp.toString());
        assertEquals(2, both.code());
        assertTrue(both.err().contains("give the range one way"), both.err());
        TestCommandLine.Outcome ramp = TestCommandLine.exec("scan", "--field", "ramp", "--energy-max", "1MeV", "--out",
                tmp.toString());
        assertEquals(2, ramp.code());
        assertTrue(ramp.err().contains("scanned in its time scale"), ramp.err());
        TestCommandLine.Outcome huge = TestCommandLine.exec("scan", "--field", "mirror", "--energy-max", "100GeV", "--out",
                tmp.toString());
        assertEquals(2, huge.code());
        assertTrue(huge.err().contains("eps < 1"), huge.err());
        TestCommandLine.Outcome word = TestCommandLine.exec("run", "--field", "mirror", "--energy", "lots");
        assertEquals(2, word.code());
        assertTrue(word.err().contains("not an energy"), word.err());
    }
}
