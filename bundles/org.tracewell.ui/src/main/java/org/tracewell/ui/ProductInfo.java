package org.tracewell.ui;

import org.osgi.framework.Bundle;
import org.osgi.framework.FrameworkUtil;
import org.osgi.framework.Version;

/** Version facts shown in the window title and the About dialog. */
public final class ProductInfo {

    private ProductInfo() {
    }

    /** Major.minor.micro of the workbench bundle, e.g. "0.1.0". */
    public static String version() {
        Bundle bundle = FrameworkUtil.getBundle(ProductInfo.class);
        Version v = bundle == null ? Version.emptyVersion : bundle.getVersion();
        return v.getMajor() + "." + v.getMinor() + "." + v.getMicro();
    }

    /** Full version including the build qualifier, e.g. "0.1.0.202612011830". */
    public static String buildVersion() {
        Bundle bundle = FrameworkUtil.getBundle(ProductInfo.class);
        return bundle == null ? "unknown" : bundle.getVersion().toString();
    }
}
