package org.tracewell.core.io;

import java.io.IOException;
import java.io.InputStream;
import java.util.Map;
import java.util.Optional;
import java.util.WeakHashMap;

import javax.xml.parsers.ParserConfigurationException;
import javax.xml.parsers.SAXParser;

import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.InternalEObject;
import org.eclipse.emf.ecore.xmi.XMLHelper;
import org.eclipse.emf.ecore.xmi.XMLLoad;
import org.eclipse.emf.ecore.xmi.XMLResource;
import org.eclipse.emf.ecore.xmi.impl.SAXXMIHandler;
import org.eclipse.emf.ecore.xmi.impl.XMILoadImpl;
import org.eclipse.emf.ecore.xmi.impl.XMIResourceImpl;
import org.xml.sax.SAXException;
import org.xml.sax.helpers.DefaultHandler;

/**
 * XMI resource of {@code *.machine} and {@code *.axis} files. Parses only with {@link SafeXml}'s hardened parser and
 * remembers where each element started, so validation can point at file, line and column.
 * <p>
 * Elements are identified by their {@code id} attribute (an EMF ID attribute), so references inside and across files
 * read {@code library/z-column.axis#lm-z} instead of positional paths that change when elements are reordered.
 */
public class TracewellResource extends XMIResourceImpl {

    private final Map<EObject, int[]> startPositions = new WeakHashMap<>();

    public TracewellResource(URI uri) {
        super(uri);
    }

    /** Line and column (1-based) of the start tag of an element read from this resource's file. */
    public Optional<int[]> startOf(EObject element) {
        int[] position = startPositions.get(element);
        return position == null ? Optional.empty() : Optional.of(position.clone());
    }

    @Override
    protected void doUnload() {
        startPositions.clear();
        super.doUnload();
    }

    @Override
    protected XMLLoad createXMLLoad() {
        return new SafeLoad(createXMLHelper());
    }

    @Override
    protected XMLLoad createXMLLoad(Map<?, ?> options) {
        return createXMLLoad();
    }

    private final class SafeLoad extends XMILoadImpl {

        SafeLoad(XMLHelper helper) {
            super(helper);
        }

        private SAXParser parser;

        @Override
        protected SAXParser makeParser() throws ParserConfigurationException, SAXException {
            parser = SafeXml.acquire(namespaceAware);
            return parser;
        }

        @Override
        public void load(XMLResource xmlResource, InputStream inputStream, Map<?, ?> options) throws IOException {
            try {
                super.load(xmlResource, inputStream, options);
            } finally {
                if (parser != null) {
                    SafeXml.release(parser);
                    parser = null;
                }
            }
        }

        @Override
        protected DefaultHandler makeDefaultHandler() {
            return new SAXXMIHandler(resource, helper, options) {
                @Override
                protected void processObject(EObject object) {
                    if (object != null) {
                        startPositions.put(object, new int[] {getLineNumber(), getColumnNumber()});
                    }
                    super.processObject(object);
                }

                @Override
                protected void handleProxy(InternalEObject proxy, String uriLiteral) {
                    // Remember where a cross-file reference was written, to report a missing file right there.
                    if (proxy != null) {
                        startPositions.put(proxy, new int[] {getLineNumber(), getColumnNumber()});
                    }
                    super.handleProxy(proxy, uriLiteral);
                }
            };
        }
    }
}
