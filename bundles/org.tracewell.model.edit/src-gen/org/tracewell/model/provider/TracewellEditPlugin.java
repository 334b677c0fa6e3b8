/**
 */
package org.tracewell.model.provider;

import org.eclipse.emf.common.EMFPlugin;

import org.eclipse.emf.common.util.ResourceLocator;

/**
 * This is the central singleton for the Tracewell edit plugin.
 * <!-- begin-user-doc -->
 * <!-- end-user-doc -->
 * @generated
 */
public final class TracewellEditPlugin extends EMFPlugin {
	/**
	 * Keep track of the singleton.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final TracewellEditPlugin INSTANCE = new TracewellEditPlugin();

	/**
	 * Keep track of the singleton.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private static Implementation plugin;

	/**
	 * Create the instance.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public TracewellEditPlugin() {
		super
		  (new ResourceLocator [] {
		   });
	}

	/**
	 * Returns the singleton instance of the Eclipse plugin.
	 * <!-- begin-user-doc -->
	 * Always {@code null}: there is no Eclipse plugin instance (see {@link Implementation}), so {@link EMFPlugin}
	 * locates {@code plugin.properties} and the icons relative to this class, in OSGi and in a plain JVM alike.
	 * <!-- end-user-doc -->
	 * @return {@code null}
	 * @generated NOT
	 */
	@Override
	public ResourceLocator getPluginResourceLocator() {
		return null;
	}

	/**
	 * Returns the singleton instance of the Eclipse plugin.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the singleton instance.
	 * @generated
	 */
	public static Implementation getPlugin() {
		return plugin;
	}

	/**
	 * Deliberately not an Eclipse {@code Plugin}: the edit bundle needs neither an activator nor
	 * {@code org.eclipse.core.runtime}, so item providers run in a plain JVM (command line, tests) as well as in the
	 * workbench. With no plugin instance, {@link EMFPlugin} finds {@code plugin.properties} and the icons relative to
	 * this class. Kept as a named member so that regeneration does not bring back the runtime-bound subclass.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated NOT
	 */
	public static final class Implementation {
		private Implementation() {
		}
	}

}
