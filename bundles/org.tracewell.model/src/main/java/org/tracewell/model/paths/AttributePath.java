package org.tracewell.model.paths;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.eclipse.emf.ecore.EAttribute;
import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EReference;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.eclipse.emf.ecore.util.EcoreUtil;
import org.tracewell.model.TracewellPackage;

/**
 * The address of one numeric attribute inside a machine, written as the machine builder would say it:
 * {@code axis[X1].plant.loadMass}, {@code axis[Y].controller.positionGain},
 * {@code axis[Y].controller.filterStages[lm3020-y-notch].centreFrequency}, {@code contour[lm3020-line-45].feed},
 * {@code budgetLines[lm3020-b-x1-thermal].value}, {@code interpolationPeriod}.
 * <p>
 * Each dot-separated segment names a feature of the element reached so far, by its metamodel name; a list is
 * also found by its singular ({@code contour} for {@code contours}, {@code axis} for the machine's inline and
 * library axes). A list needs a key in brackets: the element's name, its id, or its 0-based position. The last
 * segment is a numeric attribute (a key picks one coefficient of a list of numbers). Resolution is EMF reflection
 * over the metamodel, so every numeric attribute can be addressed, including those added later.
 * <p>
 * Immutable; parse once, resolve against each machine copy.
 */
public final class AttributePath {

    private static final Pattern SEGMENT = Pattern.compile("([A-Za-z][A-Za-z0-9_]*)(?:\\[([^\\[\\]]+)\\])?");
    private static final Set<Class<?>> NUMERIC = Set.of(double.class, Double.class, float.class, Float.class,
            int.class, Integer.class, long.class, Long.class);

    private record Segment(String name, String key) {
        @Override
        public String toString() {
            return key == null ? name : name + "[" + key + "]";
        }
    }

    private final String text;
    private final List<Segment> segments;

    private AttributePath(String text, List<Segment> segments) {
        this.text = text;
        this.segments = List.copyOf(segments);
    }

    /**
     * @throws AttributePathException when the text is not a dot-separated list of {@code name} or {@code name[key]}
     */
    public static AttributePath parse(String text) {
        if (text == null || text.isBlank()) {
            throw new AttributePathException(String.valueOf(text), "empty; expected e.g. axis[X1].plant.loadMass");
        }
        String trimmed = text.strip();
        List<Segment> segments = new ArrayList<>();
        int at = 0;
        while (at <= trimmed.length()) {
            int dot = nextDot(trimmed, at);
            String part = trimmed.substring(at, dot);
            Matcher m = SEGMENT.matcher(part);
            if (!m.matches()) {
                throw new AttributePathException(trimmed, "segment " + (segments.size() + 1) + " '" + part
                        + "' is not a feature name with an optional [key]; expected e.g. axis[X1].plant.loadMass");
            }
            segments.add(new Segment(m.group(1), m.group(2) == null ? null : m.group(2).strip()));
            at = dot + 1;
        }
        return new AttributePath(trimmed, segments);
    }

    /** Next '.' outside brackets (names and ids may contain dots inside a key), or the end. */
    private static int nextDot(String text, int from) {
        int depth = 0;
        for (int i = from; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c == '[') {
                depth++;
            } else if (c == ']') {
                depth--;
            } else if (c == '.' && depth == 0) {
                return i;
            }
        }
        return text.length();
    }

    /** The path as given (trimmed). */
    public String text() {
        return text;
    }

    @Override
    public String toString() {
        return text;
    }

    /**
     * Finds the attribute in {@code root} (a machine, or a machine copy).
     *
     * @throws AttributePathException naming the segment that fails, the element searched and the valid names
     */
    public AttributeTarget resolve(EObject root) {
        EObject at = root;
        for (int i = 0; i < segments.size(); i++) {
            Segment segment = segments.get(i);
            boolean last = i == segments.size() - 1;
            List<EStructuralFeature> features = features(at.eClass(), segment.name());
            if (features.isEmpty()) {
                List<String> elements = references(at.eClass());
                throw new AttributePathException(text, describe(at) + " has no feature '" + segment.name() + "'; "
                        + "numeric attributes there: " + numericAttributes(at.eClass())
                        + (elements.isEmpty() ? "" : "; elements there: " + elements));
            }
            EStructuralFeature feature = features.get(0);
            if (feature instanceof EAttribute attribute) {
                return attribute(at, attribute, segment, last);
            }
            at = element(at, features, segment, last);
        }
        throw new AttributePathException(text, "ends at " + describe(at) + ", not at a numeric attribute; numeric"
                + " attributes there: " + numericAttributes(at.eClass()));
    }

    private AttributeTarget attribute(EObject owner, EAttribute attribute, Segment segment, boolean last) {
        if (!last) {
            throw new AttributePathException(text, "'" + segment.name() + "' of " + describe(owner)
                    + " is a value, so nothing can follow it");
        }
        if (!NUMERIC.contains(attribute.getEAttributeType().getInstanceClass())) {
            throw new AttributePathException(text, "'" + attribute.getName() + "' of " + describe(owner) + " is not"
                    + " numeric (" + attribute.getEAttributeType().getName() + "); numeric attributes there: "
                    + numericAttributes(owner.eClass()));
        }
        if (!attribute.isMany()) {
            if (segment.key() != null) {
                throw new AttributePathException(text, "'" + attribute.getName() + "' of " + describe(owner)
                        + " is a single value and takes no [" + segment.key() + "]");
            }
            return new AttributeTarget(canonical(), owner, attribute, -1);
        }
        int size = ((List<?>) owner.eGet(attribute)).size();
        int index = segment.key() == null ? -1 : index(segment.key());
        if (index < 0 || index >= size) {
            throw new AttributePathException(text, "'" + attribute.getName() + "' of " + describe(owner) + " is a list"
                    + " of " + size + " numbers; pick one by position, " + attribute.getName() + "[0] to "
                    + attribute.getName() + "[" + (size - 1) + "]");
        }
        return new AttributeTarget(canonical(), owner, attribute, index);
    }

    @SuppressWarnings("unchecked")
    private EObject element(EObject owner, List<EStructuralFeature> features, Segment segment, boolean last) {
        EReference first = (EReference) features.get(0);
        if (last) {
            Object value = first.isMany() ? null : owner.eGet(first);
            EClass type = value instanceof EObject e ? e.eClass() : first.getEReferenceType();
            throw new AttributePathException(text, "'" + segment + "' is an element of " + describe(owner)
                    + ", not a number; continue with one of its numeric attributes: " + numericAttributes(type));
        }
        if (!first.isMany()) {
            if (segment.key() != null) {
                throw new AttributePathException(text, "'" + first.getName() + "' of " + describe(owner) + " is a"
                        + " single element and takes no [" + segment.key() + "]");
            }
            EObject value = (EObject) owner.eGet(first);
            if (value == null) {
                throw new AttributePathException(text, describe(owner) + " has no " + first.getName());
            }
            return value;
        }
        List<EObject> candidates = new ArrayList<>();
        for (EStructuralFeature f : features) {
            candidates.addAll((List<EObject>) owner.eGet(f));
        }
        if (segment.key() == null) {
            throw new AttributePathException(text, "'" + segment.name() + "' of " + describe(owner) + " is a list;"
                    + " pick one by name, id or position, e.g. " + segment.name() + "[" + keyOf(candidates, 0)
                    + "]; there: " + keys(candidates));
        }
        List<EObject> matches = new ArrayList<>();
        for (EObject candidate : candidates) {
            if (segment.key().equals(EcoreUtil.getID(candidate)) || segment.key().equals(nameOf(candidate))) {
                matches.add(candidate);
            }
        }
        if (matches.isEmpty() && segment.key().chars().allMatch(Character::isDigit)) {
            int index = index(segment.key());
            if (index >= 0 && index < candidates.size()) {
                return candidates.get(index);
            }
        }
        if (matches.size() == 1) {
            return matches.get(0);
        }
        if (matches.size() > 1) {
            throw new AttributePathException(text, "'" + segment.key() + "' names " + matches.size() + " elements of "
                    + describe(owner) + "; use the id: " + matches.stream().map(EcoreUtil::getID).toList());
        }
        throw new AttributePathException(text, describe(owner) + " has no " + segment.name() + " '" + segment.key()
                + "'; there: " + keys(candidates));
    }

    /** The path with every key as given, trimmed: the name under which results report the parameter. */
    private String canonical() {
        return String.join(".", segments.stream().map(Segment::toString).toList());
    }

    // ------------------------------------------------------------------------------------------------ lookup

    /**
     * Features a segment name can mean: the feature of that name, else the list whose singular it is. On a machine,
     * {@code axis} (and {@code axes}) means the inline and the library axes.
     */
    private static List<EStructuralFeature> features(EClass eClass, String name) {
        if (eClass == TracewellPackage.Literals.MACHINE && (name.equals("axis") || name.equals("axes"))) {
            return List.of(TracewellPackage.Literals.MACHINE__AXES, TracewellPackage.Literals.MACHINE__LIBRARY_AXES);
        }
        EStructuralFeature exact = eClass.getEStructuralFeature(name);
        if (exact != null) {
            return List.of(exact);
        }
        for (EStructuralFeature f : eClass.getEAllStructuralFeatures()) {
            if (f.isMany() && singular(f.getName()).equals(name)) {
                return List.of(f);
            }
        }
        return List.of();
    }

    static String singular(String plural) {
        if (plural.endsWith("ies")) {
            return plural.substring(0, plural.length() - 3) + "y";
        }
        if (plural.endsWith("axes") || plural.endsWith("Axes")) {
            return plural.substring(0, plural.length() - 2) + "is";
        }
        return plural.endsWith("s") ? plural.substring(0, plural.length() - 1) : plural;
    }

    private static int index(String key) {
        try {
            return Integer.parseInt(key);
        } catch (NumberFormatException e) {
            return -1;
        }
    }

    private static String nameOf(EObject element) {
        EStructuralFeature name = element.eClass().getEStructuralFeature("name");
        Object value = name instanceof EAttribute ? element.eGet(name) : null;
        return value instanceof String s && !s.isBlank() ? s : null;
    }

    private static String keyOf(List<EObject> elements, int i) {
        if (elements.isEmpty()) {
            return "0";
        }
        String name = nameOf(elements.get(i));
        return name != null ? name : String.valueOf(EcoreUtil.getID(elements.get(i)));
    }

    private static String keys(List<EObject> elements) {
        if (elements.isEmpty()) {
            return "none";
        }
        List<String> keys = new ArrayList<>();
        for (int i = 0; i < elements.size(); i++) {
            String name = nameOf(elements.get(i));
            String id = EcoreUtil.getID(elements.get(i));
            keys.add(name == null ? id : name + " (" + id + ")");
        }
        return String.join(", ", keys);
    }

    /** Numeric attributes of a class, metamodel order. */
    public static List<String> numericAttributes(EClass eClass) {
        List<String> names = new ArrayList<>();
        for (EAttribute a : eClass.getEAllAttributes()) {
            if (NUMERIC.contains(a.getEAttributeType().getInstanceClass())) {
                names.add(a.isMany() ? a.getName() + "[i]" : a.getName());
            }
        }
        return names;
    }

    private static List<String> references(EClass eClass) {
        List<String> names = new ArrayList<>();
        for (EReference r : eClass.getEAllContainments()) {
            names.add(r.isMany() ? singular(r.getName()) + "[…]" : r.getName());
        }
        if (eClass == TracewellPackage.Literals.MACHINE) {
            names.remove(singular(TracewellPackage.Literals.MACHINE__AXES.getName()) + "[…]");
            names.add(0, "axis[…]");
        }
        return names;
    }

    private static String describe(EObject element) {
        String id = EcoreUtil.getID(element);
        String name = nameOf(element);
        return element.eClass().getName() + (name != null ? " '" + name + "'" : "")
                + (id != null && !id.equals(name) ? " (" + id + ")" : "");
    }
}
