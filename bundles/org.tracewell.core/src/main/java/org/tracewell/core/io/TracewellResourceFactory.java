package org.tracewell.core.io;

import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.emf.ecore.resource.impl.ResourceFactoryImpl;

/** Creates {@link TracewellResource}s for {@code *.machine} and {@code *.axis} files. */
public final class TracewellResourceFactory extends ResourceFactoryImpl {

    @Override
    public Resource createResource(URI uri) {
        return new TracewellResource(uri);
    }
}
