/**
 */
package org.tracewell.model.provider;


import java.util.Collection;
import java.util.List;

import org.eclipse.emf.common.notify.AdapterFactory;
import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.edit.provider.ComposeableAdapterFactory;
import org.eclipse.emf.edit.provider.IItemPropertyDescriptor;
import org.eclipse.emf.edit.provider.ItemPropertyDescriptor;
import org.eclipse.emf.edit.provider.ViewerNotification;

import org.tracewell.model.edit.units.AxisLabelRefresh;
import org.tracewell.model.edit.units.TradeLabels;

import org.tracewell.model.RigidScrewDrive;
import org.tracewell.model.TracewellPackage;

/**
 * This is the item provider adapter for a {@link org.tracewell.model.RigidScrewDrive} object.
 * <!-- begin-user-doc -->
 * <!-- end-user-doc -->
 * @generated
 */
public class RigidScrewDriveItemProvider extends MotorDrivenPlantItemProvider {
	/**
	 * This constructs an instance from a factory and a notifier.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public RigidScrewDriveItemProvider(AdapterFactory adapterFactory) {
		super(adapterFactory);
	}

	/**
	 * This returns the property descriptors for the adapted class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public List<IItemPropertyDescriptor> getPropertyDescriptors(Object object) {
		if (itemPropertyDescriptors == null) {
			super.getPropertyDescriptors(object);

			addMotorInertiaPropertyDescriptor(object);
			addScrewInertiaPropertyDescriptor(object);
			addLoadMassPropertyDescriptor(object);
			addLeadPropertyDescriptor(object);
			addGearRatioPropertyDescriptor(object);
			addTorqueConstantPropertyDescriptor(object);
		}
		return itemPropertyDescriptors;
	}

	/**
	 * This adds a property descriptor for the Motor Inertia feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addMotorInertiaPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_RigidScrewDrive_motorInertia_feature"), //$NON-NLS-1$
				 getString("_UI_PropertyDescriptor_description", "_UI_RigidScrewDrive_motorInertia_feature", "_UI_RigidScrewDrive_type"), //$NON-NLS-1$ //$NON-NLS-2$ //$NON-NLS-3$
				 TracewellPackage.Literals.RIGID_SCREW_DRIVE__MOTOR_INERTIA,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Screw Inertia feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addScrewInertiaPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_RigidScrewDrive_screwInertia_feature"), //$NON-NLS-1$
				 getString("_UI_PropertyDescriptor_description", "_UI_RigidScrewDrive_screwInertia_feature", "_UI_RigidScrewDrive_type"), //$NON-NLS-1$ //$NON-NLS-2$ //$NON-NLS-3$
				 TracewellPackage.Literals.RIGID_SCREW_DRIVE__SCREW_INERTIA,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Load Mass feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addLoadMassPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_RigidScrewDrive_loadMass_feature"), //$NON-NLS-1$
				 getString("_UI_PropertyDescriptor_description", "_UI_RigidScrewDrive_loadMass_feature", "_UI_RigidScrewDrive_type"), //$NON-NLS-1$ //$NON-NLS-2$ //$NON-NLS-3$
				 TracewellPackage.Literals.RIGID_SCREW_DRIVE__LOAD_MASS,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Lead feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addLeadPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_RigidScrewDrive_lead_feature"), //$NON-NLS-1$
				 getString("_UI_PropertyDescriptor_description", "_UI_RigidScrewDrive_lead_feature", "_UI_RigidScrewDrive_type"), //$NON-NLS-1$ //$NON-NLS-2$ //$NON-NLS-3$
				 TracewellPackage.Literals.RIGID_SCREW_DRIVE__LEAD,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Gear Ratio feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addGearRatioPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_RigidScrewDrive_gearRatio_feature"), //$NON-NLS-1$
				 getString("_UI_PropertyDescriptor_description", "_UI_RigidScrewDrive_gearRatio_feature", "_UI_RigidScrewDrive_type"), //$NON-NLS-1$ //$NON-NLS-2$ //$NON-NLS-3$
				 TracewellPackage.Literals.RIGID_SCREW_DRIVE__GEAR_RATIO,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Torque Constant feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addTorqueConstantPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_RigidScrewDrive_torqueConstant_feature"), //$NON-NLS-1$
				 getString("_UI_PropertyDescriptor_description", "_UI_RigidScrewDrive_torqueConstant_feature", "_UI_RigidScrewDrive_type"), //$NON-NLS-1$ //$NON-NLS-2$ //$NON-NLS-3$
				 TracewellPackage.Literals.RIGID_SCREW_DRIVE__TORQUE_CONSTANT,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This returns RigidScrewDrive.gif.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object getImage(Object object) {
		return overlayImage(object, getResourceLocator().getImage("full/obj16/RigidScrewDrive")); //$NON-NLS-1$
	}

	/**
	 * This returns the label text for the adapted class.
	 * <!-- begin-user-doc -->
	 * In trade units, through the one label helper of the edit bundle.
	 * <!-- end-user-doc -->
	 * @generated NOT
	 */
	@Override
	public String getText(Object object) {
		return TradeLabels.text(object);
	}


	/**
	 * This handles model notifications by calling {@link #updateChildren} to update any cached
	 * children and by creating a viewer notification, which it passes to {@link #fireNotifyChanged}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void notifyChanged(Notification notification) {
		updateChildren(notification);

		switch (notification.getFeatureID(RigidScrewDrive.class)) {
			case TracewellPackage.RIGID_SCREW_DRIVE__MOTOR_INERTIA:
			case TracewellPackage.RIGID_SCREW_DRIVE__SCREW_INERTIA:
			case TracewellPackage.RIGID_SCREW_DRIVE__LOAD_MASS:
			case TracewellPackage.RIGID_SCREW_DRIVE__LEAD:
			case TracewellPackage.RIGID_SCREW_DRIVE__GEAR_RATIO:
			case TracewellPackage.RIGID_SCREW_DRIVE__TORQUE_CONSTANT:
				fireNotifyChanged(new ViewerNotification(notification, notification.getNotifier(), false, true));
				return;
		}
		super.notifyChanged(notification);
	}

	/**
	 * This adds {@link org.eclipse.emf.edit.command.CommandParameter}s describing the children
	 * that can be created under this object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected void collectNewChildDescriptors(Collection<Object> newChildDescriptors, Object object) {
		super.collectNewChildDescriptors(newChildDescriptors, object);
	}

	/**
	 * Hand-written (kept by regeneration): the axis label shows this element's figures, so refresh it too.
	 */
	@Override
	public void fireNotifyChanged(Notification notification) {
		super.fireNotifyChanged(notification);
		AxisLabelRefresh.forContainingAxis(notification).ifPresent(super::fireNotifyChanged);
	}

}
