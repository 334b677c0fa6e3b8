package org.tracewell.model.edit.units;

import java.util.Optional;

import org.eclipse.emf.common.notify.Notification;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.edit.provider.ViewerNotification;
import org.tracewell.model.Axis;

/**
 * An axis label shows figures of its plant and controller ("Y · ball screw 10 mm · Kv 3.0 (m/min)/mm"), so a label
 * change of a plant or controller must refresh the label of the axis holding it as well.
 */
public final class AxisLabelRefresh {

    private AxisLabelRefresh() {
    }

    /** The label update to fire for the containing axis, when {@code notification} updates a child's label. */
    public static Optional<Notification> forContainingAxis(Notification notification) {
        if (notification instanceof ViewerNotification viewer && viewer.isLabelUpdate()
                && viewer.getNotifier() instanceof EObject child && child.eContainer() instanceof Axis axis) {
            return Optional.of(new ViewerNotification(notification, axis, false, true));
        }
        return Optional.empty();
    }
}
