// The main window's widgets and their arrangement, the settings that
// remember it, and the title, caution banner and status line.
#include "MainWindow.h"

#include "BodePlotView.h"
#include "CornerTable.h"
#include "Inspector.h"
#include "SafetyCaution.h"
#include "SchematicDocument.h"
#include "SchematicView.h"
#include "TimeConstantTable.h"

#include <QAction>
#include <QCloseEvent>
#include <QDockWidget>
#include <QFileInfo>
#include <QLabel>
#include <QScrollArea>
#include <QSettings>
#include <QSplitter>
#include <QStatusBar>
#include <QVBoxLayout>

namespace tauline::ui {

namespace {

// Bumped when the docks change, so an older saved arrangement is not used.
constexpr int kWindowStateVersion = 2;

}  // namespace

void MainWindow::buildViews()
{
    canvas_ = new SchematicView(document_);
    canvas_->setMinimumSize(320, 240);
    plot_ = new BodePlotView;

    splitter_ = new QSplitter(Qt::Horizontal);
    splitter_->setObjectName(QStringLiteral("canvasPlotSplitter"));
    splitter_->addWidget(canvas_);
    splitter_->addWidget(plot_);
    splitter_->setStretchFactor(0, 5);
    splitter_->setStretchFactor(1, 5);
    splitter_->setChildrenCollapsible(false);

    banner_ = new QLabel(QStringLiteral("⚠  ") + safetyCautionText());
    banner_->setWordWrap(true);
    banner_->setStyleSheet(QStringLiteral(
        "background: #fff3cf; color: #5a4300; border-bottom: 1px solid #e2c36b; padding: 6px 10px;"));
    banner_->hide();

    auto* central = new QWidget;
    auto* layout = new QVBoxLayout(central);
    layout->setContentsMargins(0, 0, 0, 0);
    layout->setSpacing(0);
    layout->addWidget(banner_);
    layout->addWidget(splitter_, 1);
    setCentralWidget(central);

    inspector_ = new Inspector(document_);
    auto* inspectorDock = new QDockWidget(tr("Inspector"), this);
    inspectorDock->setObjectName(QStringLiteral("inspectorDock"));
    inspectorDock->setWidget(inspector_);
    addDockWidget(Qt::BottomDockWidgetArea, inspectorDock);

    corners_ = new CornerTable;
    auto* cornerDock = new QDockWidget(tr("Corners"), this);
    cornerDock->setObjectName(QStringLiteral("cornerDock"));
    cornerDock->setWidget(corners_);
    addDockWidget(Qt::BottomDockWidgetArea, cornerDock);
    splitDockWidget(inspectorDock, cornerDock, Qt::Horizontal);

    timeConstants_ = new TimeConstantTable;
    auto* tauDock = new QDockWidget(tr("Time Constants"), this);
    tauDock->setObjectName(QStringLiteral("timeConstantDock"));
    // The factored response sits under the list it is built from, in a
    // scrolling pane of its own: it runs to a line per corner, and its text
    // changes with every value edit; as a plain member of the dock's layout
    // it squeezed the list to a row or two and laid the whole window out
    // again on every step of a value drag.
    auto* factoredPane = new QScrollArea;
    factoredPane->setObjectName(QStringLiteral("factoredFormPane"));
    factoredPane->setWidgetResizable(true);
    factoredPane->setFrameShape(QFrame::NoFrame);
    factoredPane->setWidget(timeConstants_->factoredLabel());
    auto* tauPanel = new QSplitter(Qt::Vertical);
    tauPanel->setObjectName(QStringLiteral("timeConstantSplitter"));
    tauPanel->addWidget(timeConstants_);
    tauPanel->addWidget(factoredPane);
    tauPanel->setStretchFactor(0, 3);
    tauPanel->setStretchFactor(1, 2);
    tauPanel->setChildrenCollapsible(false);
    tauDock->setWidget(tauPanel);
    addDockWidget(Qt::BottomDockWidgetArea, tauDock);
    splitDockWidget(cornerDock, tauDock, Qt::Horizontal);

    // Canvas and plot across the top, the part and the numbers beneath.
    resizeDocks({cornerDock}, {230}, Qt::Vertical);
    resizeDocks({inspectorDock, cornerDock, tauDock}, {250, 610, 380}, Qt::Horizontal);

    status_ = new QLabel;
    status_->setTextFormat(Qt::PlainText);
    statusBar()->addWidget(status_, 1);
}

void MainWindow::restoreSettings()
{
    QSettings settings;
    if (!restoreGeometry(settings.value("mainWindow/geometry").toByteArray()))
        resize(1280, 800);
    restoreState(settings.value("mainWindow/state").toByteArray(), kWindowStateVersion);
    if (!splitter_->restoreState(settings.value("mainWindow/splitter").toByteArray()))
        splitter_->setSizes({540, 500});
    phaseAction_->setChecked(settings.value("view/phase", false).toBool());
}

void MainWindow::saveSettings() const
{
    QSettings settings;
    settings.setValue("mainWindow/geometry", saveGeometry());
    settings.setValue("mainWindow/state", saveState(kWindowStateVersion));
    settings.setValue("mainWindow/splitter", splitter_->saveState());
}

void MainWindow::closeEvent(QCloseEvent* event)
{
    if (!maybeSave()) {
        event->ignore();
        return;
    }
    saveSettings();
    event->accept();
}

void MainWindow::showEvent(QShowEvent* event)
{
    QMainWindow::showEvent(event);
    if (shownOnce_)
        return;
    shownOnce_ = true;
    // The docks take their sizes only once the window is on screen, after the
    // canvas placed the drawing for its first, smaller size: place it again
    // (a view saved in the file is restored, anything else fitted).
    const bool savedView = viewFromFile_;
    const QPointF centre = document_->viewCentre();
    const double zoom = document_->viewZoom();
    QMetaObject::invokeMethod(
        this, [this, savedView, centre, zoom] {
            if (savedView) {
                canvas_->setZoom(zoom);
                canvas_->centerOn(centre);
            } else {
                canvas_->fitDrawing();
            }
        },
        Qt::QueuedConnection);
}

void MainWindow::updateTitle()
{
    const QString path = document_->filePath();
    QString name = path.isEmpty() ? tr("Untitled") : QFileInfo(path).fileName();
    if (!document_->title().isEmpty())
        name += QStringLiteral(" — ") + document_->title();
    setWindowTitle(name + QStringLiteral("[*] — Tauline"));
    setWindowModified(document_->isModified());
}

void MainWindow::updateCaution()
{
    banner_->setVisible(suggestsHazardousUse(document_->title()));
}

void MainWindow::setStatus(const QString& text, bool problem)
{
    // The engine's messages can run to several lines; the status bar has one.
    QString line = text;
    line.replace(QLatin1Char('\n'), QStringLiteral("  ·  "));
    status_->setText(line);
    status_->setToolTip(text);
    status_->setStyleSheet(problem ? QStringLiteral("color: #b02a1a;") : QString());
}

QString MainWindow::statusText() const
{
    return status_->text();
}

}  // namespace tauline::ui
