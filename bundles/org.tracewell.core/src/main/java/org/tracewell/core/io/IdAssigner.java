package org.tracewell.core.io;

import java.util.HashSet;
import java.util.Iterator;
import java.util.Locale;
import java.util.Set;

import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EStructuralFeature;
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
        Set<String> used = idsIn(resource);
        int assigned = 0;
        for (Iterator<EObject> it = resource.getAllContents(); it.hasNext();) {
            EObject element = it.next();
            if (assign(element, prefixOf(element.eContainer(), resource), element.eContainingFeature(), used)) {
                assigned++;
            }
        }
        return assigned;
    }

    /**
     * Gives a new element, about to be added to {@code parent} through {@code feature}, and everything it contains the
     * ids saving would give them, unique among the ids of {@code resource}; so an element added in the editor is
     * complete (ids are required) before it is ever saved. Existing ids are kept.
     */
    public static void assignNewIds(EObject element, EObject parent, EStructuralFeature feature, Resource resource) {
        Set<String> used = resource == null ? new HashSet<>() : idsIn(resource);
        assign(element, prefixOf(parent, resource), feature, used);
        for (Iterator<EObject> it = element.eAllContents(); it.hasNext();) {
            EObject child = it.next();
            assign(child, prefixOf(child.eContainer(), resource), child.eContainingFeature(), used);
        }
    }

    private static Set<String> idsIn(Resource resource) {
        Set<String> used = new HashSet<>();
        for (Iterator<EObject> it = resource.getAllContents(); it.hasNext();) {
            if (it.next() instanceof Identified identified && identified.getId() != null
                    && !identified.getId().isBlank()) {
                used.add(identified.getId());
            }
        }
        return used;
    }

    /** Sets a fresh id on an element that has none; true when one was set. */
    private static boolean assign(EObject element, String prefix, EStructuralFeature feature, Set<String> used) {
        if (!(element instanceof Identified identified) || identified.getId() != null && !identified.getId().isBlank()) {
            return false;
        }
        String base = prefix + "-" + slug(localName(element, feature));
        String id = base;
        for (int n = 2; used.contains(id); n++) {
            id = base + "-" + n;
        }
        identified.setId(id);
        used.add(id);
        return true;
    }

    private static String prefixOf(EObject container, Resource resource) {
        if (container instanceof Identified parent && parent.getId() != null && !parent.getId().isBlank()) {
            return parent.getId();
        }
        URI uri = resource == null ? null : resource.getURI();
        String base = uri == null || uri.lastSegment() == null ? "element" : uri.trimFileExtension().lastSegment();
        return slug(base);
    }

    private static String localName(EObject element, EStructuralFeature feature) {
        if (element instanceof Named named && named.getName() != null && !named.getName().isBlank()) {
            return named.getName();
        }
        return feature == null ? element.eClass().getName() : feature.getName();
    }

    /** Lower-case letters, digits and single dashes: safe in XML ids and URI fragments (also for ids given by hand). */
    public static String slug(String text) {
        String dashed = text.replaceAll("([a-z0-9])([A-Z])", "$1-$2").toLowerCase(Locale.ROOT)
                .replaceAll("[^a-z0-9]+", "-").replaceAll("(^-+)|(-+$)", "");
        return dashed.isEmpty() ? "element" : dashed;
    }
}
