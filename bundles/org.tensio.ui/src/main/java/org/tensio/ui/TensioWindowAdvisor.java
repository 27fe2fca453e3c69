package org.tensio.ui;

import org.eclipse.swt.graphics.Point;
import org.eclipse.ui.application.IWorkbenchWindowConfigurer;
import org.eclipse.ui.application.WorkbenchWindowAdvisor;

/** Window advisor: initial size and title of the workbench window. */
final class TensioWindowAdvisor extends WorkbenchWindowAdvisor {

    private static final Point INITIAL_SIZE = new Point(1200, 720);

    TensioWindowAdvisor(IWorkbenchWindowConfigurer configurer) {
        super(configurer);
    }

    @Override
    public void preWindowOpen() {
        IWorkbenchWindowConfigurer configurer = getWindowConfigurer();
        configurer.setInitialSize(INITIAL_SIZE);
        configurer.setTitle(Messages.TensioWindowAdvisor_title);
        configurer.setShowCoolBar(false);
        configurer.setShowStatusLine(true);
        configurer.setShowPerspectiveBar(false);
    }
}
