package org.tracewell.ui.editor;

import java.util.function.Function;

import org.eclipse.emf.common.notify.AdapterFactory;
import org.eclipse.emf.edit.provider.IItemLabelProvider;
import org.eclipse.jface.viewers.LabelProvider;

/**
 * Labels from EMF edit's item providers (trade units, see {@code TradeLabels}), with an optional suffix per element,
 * used to mark shared library axes.
 */
public final class ItemProviderLabelProvider extends LabelProvider {

    private final AdapterFactory adapterFactory;
    private final Function<Object, String> suffix;

    public ItemProviderLabelProvider(AdapterFactory adapterFactory, Function<Object, String> suffix) {
        this.adapterFactory = adapterFactory;
        this.suffix = suffix;
    }

    @Override
    public String getText(Object element) {
        IItemLabelProvider provider = (IItemLabelProvider) adapterFactory.adapt(element, IItemLabelProvider.class);
        String text = provider == null ? String.valueOf(element) : provider.getText(element);
        String extra = suffix.apply(element);
        return extra == null || extra.isEmpty() ? text : text + extra;
    }
}
