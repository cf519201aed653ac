package org.linemass.app;

import org.linemass.drawing.LengthUnit;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.TypeConversionException;

/** picocli converters that turn parser errors into one-line usage errors. */
final class Converters {

    private Converters() {
    }

    /** A positive length with unit, to metres. */
    static final class Length implements ITypeConverter<Double> {
        @Override
        public Double convert(String value) {
            try {
                return LengthParser.positiveMetres(value);
            } catch (IllegalArgumentException e) {
                throw new TypeConversionException(e.getMessage());
            }
        }
    }

    /** A drawing unit. */
    static final class Unit implements ITypeConverter<LengthUnit> {
        @Override
        public LengthUnit convert(String value) {
            try {
                return LengthParser.unit(value);
            } catch (IllegalArgumentException e) {
                throw new TypeConversionException(e.getMessage());
            }
        }
    }

    /** The exit-code threshold. */
    static final class Threshold implements ITypeConverter<FailThreshold> {
        @Override
        public FailThreshold convert(String value) {
            try {
                return FailThreshold.parse(value);
            } catch (IllegalArgumentException e) {
                throw new TypeConversionException(e.getMessage());
            }
        }
    }
}
