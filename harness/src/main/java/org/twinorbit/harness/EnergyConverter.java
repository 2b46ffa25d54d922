package org.twinorbit.harness;

import picocli.CommandLine.ITypeConverter;

/** picocli converter for energy options: eV as a number, or with a unit ({@link Format#parseEnergy}). */
public final class EnergyConverter implements ITypeConverter<Double> {

    @Override
    public Double convert(String value) {
        try {
            return Format.parseEnergy(value, "energy");
        } catch (IllegalArgumentException e) {
            throw new picocli.CommandLine.TypeConversionException("'" + value + "' is not an energy; give eV as a number "
                    + "or with a unit: 2e4, 20keV, 1.5MeV, 3GeV");
        }
    }
}
