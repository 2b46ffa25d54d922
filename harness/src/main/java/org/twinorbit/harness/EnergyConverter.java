package org.twinorbit.harness;

import picocli.CommandLine.ITypeConverter;

/**
 * picocli converter for energy options: eV as a number, or with a unit ({@link Format#parseEnergy}),
 * at most {@link Format#MAX_ENERGY_EV}. picocli names the option in the message.
 */
public final class EnergyConverter implements ITypeConverter<Double> {

    @Override
    public Double convert(String value) {
        double ev;
        try {
            ev = Format.parseEnergy(value, "energy");
        } catch (IllegalArgumentException e) {
            throw new picocli.CommandLine.TypeConversionException("'" + value + "' is not an energy; give eV as a number "
                    + "or with a unit: 2e4, 20keV, 1.5MeV, 3GeV");
        }
        if (!(ev <= Format.MAX_ENERGY_EV)) { // NaN as well
            throw new picocli.CommandLine.TypeConversionException("'" + value + "' is out of range: a kinetic energy "
                    + "must be > 0 and at most " + Format.MAX_ENERGY_TEXT);
        }
        return ev;
    }
}
