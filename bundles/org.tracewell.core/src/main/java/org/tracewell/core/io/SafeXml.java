package org.tracewell.core.io;

import java.util.Map;

import javax.xml.XMLConstants;
import javax.xml.parsers.ParserConfigurationException;
import javax.xml.parsers.SAXParser;
import javax.xml.parsers.SAXParserFactory;

import org.xml.sax.SAXException;

/**
 * The one XML parser configuration Tracewell reads files with. Model files never need a DTD, so any DOCTYPE is
 * rejected outright; external entities, external DTDs and XInclude are switched off as a second line of defence, so
 * a file can neither read a local file nor make a network request.
 */
final class SafeXml {

    static final String DISALLOW_DOCTYPE = "http://apache.org/xml/features/disallow-doctype-decl";
    static final String EXTERNAL_GENERAL_ENTITIES = "http://xml.org/sax/features/external-general-entities";
    static final String EXTERNAL_PARAMETER_ENTITIES = "http://xml.org/sax/features/external-parameter-entities";
    static final String LOAD_EXTERNAL_DTD = "http://apache.org/xml/features/nonvalidating/load-external-dtd";

    /** Features for EMF's {@code OPTION_PARSER_FEATURES}, applied in addition to {@link #newParser()}. */
    static final Map<String, Boolean> PARSER_FEATURES = Map.of(
            DISALLOW_DOCTYPE, Boolean.TRUE,
            EXTERNAL_GENERAL_ENTITIES, Boolean.FALSE,
            EXTERNAL_PARAMETER_ENTITIES, Boolean.FALSE,
            LOAD_EXTERNAL_DTD, Boolean.FALSE,
            XMLConstants.FEATURE_SECURE_PROCESSING, Boolean.TRUE);

    private SafeXml() {
    }

    /**
     * One parser per thread and namespace mode, reused after {@link SAXParser#reset()}: creating a JDK parser costs
     * far more than parsing a typical model file. A cache only — every parser handed out is configured identically.
     */
    private static final ThreadLocal<Reusable[]> CACHE = ThreadLocal.withInitial(() -> new Reusable[2]);

    /** A cached parser and whether a parse on this thread is using it (nested loads get a fresh one). */
    private static final class Reusable {
        final SAXParser parser;
        boolean inUse;

        Reusable(SAXParser parser) {
            this.parser = parser;
        }
    }

    /** A hardened parser for one parse; give it back with {@link #release(SAXParser)}. */
    static SAXParser acquire(boolean namespaceAware) throws ParserConfigurationException, SAXException {
        Reusable[] slots = CACHE.get();
        int slot = namespaceAware ? 1 : 0;
        Reusable cached = slots[slot];
        if (cached == null) {
            cached = new Reusable(newParser(namespaceAware));
            slots[slot] = cached;
        } else if (cached.inUse) {
            return newParser(namespaceAware);
        } else {
            cached.parser.reset();
            secureProperties(cached.parser);
        }
        cached.inUse = true;
        return cached.parser;
    }

    /** Marks a parser from {@link #acquire(boolean)} as free again. */
    static void release(SAXParser parser) {
        for (Reusable cached : CACHE.get()) {
            if (cached != null && cached.parser == parser) {
                cached.inUse = false;
            }
        }
    }

    /**
     * A hardened, non-validating SAX parser. Uses the JDK's own implementation ({@code newDefaultInstance}) so that
     * whatever other XML library is on the class path cannot silently weaken the settings.
     */
    static SAXParser newParser(boolean namespaceAware) throws ParserConfigurationException, SAXException {
        SAXParserFactory factory = SAXParserFactory.newDefaultInstance();
        factory.setNamespaceAware(namespaceAware);
        factory.setValidating(false);
        factory.setXIncludeAware(false);
        for (Map.Entry<String, Boolean> feature : PARSER_FEATURES.entrySet()) {
            factory.setFeature(feature.getKey(), feature.getValue());
        }
        SAXParser parser = factory.newSAXParser();
        secureProperties(parser);
        return parser;
    }

    /** No external DTD or schema access; set again after every reset, which restores factory defaults. */
    private static void secureProperties(SAXParser parser) throws SAXException {
        parser.setProperty(XMLConstants.ACCESS_EXTERNAL_DTD, "");
        parser.setProperty(XMLConstants.ACCESS_EXTERNAL_SCHEMA, "");
    }
}
