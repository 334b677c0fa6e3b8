package org.tracewell.core.io;

import java.util.HashSet;
import java.util.Iterator;
import java.util.Locale;
import java.util.Set;

import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.resource.Resource;
import org.tracewell.model.Identified;
import org.tracewell.model.Named;

/**
 * Gives every element without an id a readable, deterministic one before saving (parent id + name or type, e.g.
 * {@code lm3020-y-plant}), so references never fall back to positional paths and the same model saves to the same
 * bytes. Existing ids are never changed: they are what other files and merges rely on.
 */
public final class IdAssigner {

    private IdAssigner() {
    }

    /** Assigns ids to the elements of {@code resource} that lack one; returns how many were assigned. */
    public static int assignMissingIds(Resource resource) {
        Set<String> used = new HashSet<>();
        for (Iterator<EObject> it = resource.getAllContents(); it.hasNext();) {
            if (it.next() instanceof Identified identified && identified.getId() != null
                    && !identified.getId().isBlank()) {
                used.add(identified.getId());
            }
        }
        int assigned = 0;
        for (Iterator<EObject> it = resource.getAllContents(); it.hasNext();) {
            EObject element = it.next();
            if (element instanceof Identified identified
                    && (identified.getId() == null || identified.getId().isBlank())) {
                String base = prefixOf(element, resource) + "-" + slug(localName(element));
                String id = base;
                for (int n = 2; used.contains(id); n++) {
                    id = base + "-" + n;
                }
                identified.setId(id);
                used.add(id);
                assigned++;
            }
        }
        return assigned;
    }

    private static String prefixOf(EObject element, Resource resource) {
        EObject container = element.eContainer();
        if (container instanceof Identified parent && parent.getId() != null && !parent.getId().isBlank()) {
            return parent.getId();
        }
        URI uri = resource.getURI();
        String base = uri == null || uri.lastSegment() == null ? "element" : uri.trimFileExtension().lastSegment();
        return slug(base);
    }

    private static String localName(EObject element) {
        if (element instanceof Named named && named.getName() != null && !named.getName().isBlank()) {
            return named.getName();
        }
        return element.eContainingFeature() == null ? element.eClass().getName()
                : element.eContainingFeature().getName();
    }

    /** Lower-case letters, digits and single dashes: safe in XML ids and URI fragments. */
    static String slug(String text) {
        String dashed = text.replaceAll("([a-z0-9])([A-Z])", "$1-$2").toLowerCase(Locale.ROOT)
                .replaceAll("[^a-z0-9]+", "-").replaceAll("(^-+)|(-+$)", "");
        return dashed.isEmpty() ? "element" : dashed;
    }
}
