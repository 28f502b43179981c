package org.trundle.core.check.junit;

import java.lang.reflect.Constructor;
import java.util.stream.Stream;

import org.junit.jupiter.api.extension.ExtensionContext;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.ArgumentsProvider;
import org.junit.jupiter.params.support.AnnotationConsumer;
import org.junit.jupiter.params.support.ParameterDeclarations;
import org.trundle.core.check.CaseSource;

/** The {@link ArgumentsProvider} behind {@link KitCases}. */
public final class KitCasesProvider implements ArgumentsProvider, AnnotationConsumer<KitCases> {
    private KitCases spec;

    /** Created by JUnit. */
    public KitCasesProvider() {
    }

    @Override
    public void accept(KitCases annotation) {
        this.spec = annotation;
    }

    @Override
    public Stream<? extends Arguments> provideArguments(ParameterDeclarations parameters, ExtensionContext context)
        throws Exception {
        Constructor<? extends CaseSource> ctor = spec.source().getDeclaredConstructor();
        ctor.setAccessible(true);
        CaseSource source = ctor.newInstance();
        return PropertyArguments.of(source, spec.seed(), spec.count());
    }
}
