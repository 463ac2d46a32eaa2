package org.gatefit.cli;

import org.gatefit.catalog.Kind;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.TypeConversionException;

/** {@code --kind switch|driver}. */
final class KindConverter implements ITypeConverter<Kind> {
    @Override
    public Kind convert(String value) {
        try {
            Kind k = Kind.fromId(value);
            if (!k.isPart()) {
                throw new TypeConversionException("expected switch or driver, got '" + value + "'");
            }
            return k;
        } catch (IllegalArgumentException e) {
            throw new TypeConversionException("expected switch or driver, got '" + value + "'");
        }
    }
}
