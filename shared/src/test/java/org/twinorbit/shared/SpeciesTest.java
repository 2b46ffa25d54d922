package org.twinorbit.shared;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Parsing species names and mass,charge pairs; charges of the named species (common practice). */
class SpeciesTest {

    @Test
    void namedSpeciesParse() {
        for (Species s : Species.NAMED) {
            assertSame(s, Species.parse(s.name()));
        }
        assertSame(Species.PROTON, Species.parse("  Proton "));
        assertSame(Species.HELIUM3, Species.parse("he3"));
        assertSame(Species.HELIUM3, Species.parse("helion"));
    }

    @Test
    void chargesHaveTheRightSign() {
        assertEquals(-Constants.E, Species.ELECTRON.charge());
        assertEquals(Constants.E, Species.POSITRON.charge());
        assertEquals(2 * Constants.E, Species.ALPHA.charge());
        assertEquals(2 * Constants.E, Species.HELIUM3.charge());
        assertEquals(Constants.E, Species.TRITON.charge());
    }

    @Test
    void massChargePair() {
        Species s = Species.parse("6.6446573357e-27, 3.204353268e-19");
        assertEquals(6.6446573357e-27, s.mass());
        assertEquals(3.204353268e-19, s.charge());
        assertEquals(-1.0, Species.parse("1e-30,-1e-19").charge() / 1e-19, 1e-15);
    }

    @Test
    void unknownNameListsTheAllowedValues() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Species.parse("xenon"));
        String m = e.getMessage();
        assertTrue(m.contains("'xenon'"), m);
        for (Species s : Species.NAMED) {
            assertTrue(m.contains(s.name()), m);
        }
        assertTrue(m.contains("mass,charge"), m);
    }

    @Test
    void impossiblePairsAreRefused() {
        IllegalArgumentException mass = assertThrows(IllegalArgumentException.class, () -> Species.parse("-1e-27,1e-19"));
        assertTrue(mass.getMessage().contains("mass"), mass.getMessage());
        IllegalArgumentException charge = assertThrows(IllegalArgumentException.class, () -> Species.parse("1e-27,0"));
        assertTrue(charge.getMessage().contains("charge"), charge.getMessage());
        assertThrows(IllegalArgumentException.class, () -> Species.parse("1e-27,abc"));
    }
}
