// Every menu, toolbar and action of the main window, in one place.
//
// To add an action: find the build*Menu() below for the menu it belongs in
// and add it there, next to its neighbours, e.g.
//     QAction* a = viewMenu_->addAction(tr("&Thing…"), this, [this] { ... });
//     a->setObjectName(QStringLiteral("thingAction"));   // lets tests find it
// The lambda can call a function or widget in a file of your own; only if it
// needs state of the window's own add a member to MainWindow.h. Put it on a
// toolbar in buildToolBars() if it is used often.
#include "MainWindow.h"

#include "BodeChart.h"
#include "BodePlotView.h"
#include "CornerTable.h"
#include "CornerTableCopy.h"
#include "PlacementDrag.h"
#include "PlacementPanel.h"
#include "ReferenceCurveActions.h"
#include "ReviewPageExport.h"
#include "SafetyCaution.h"
#include "SchematicDocument.h"
#include "SchematicView.h"
#include "SensitivityView.h"

#include <QAction>
#include <QApplication>
#include <QComboBox>
#include <QMenuBar>
#include <QMessageBox>
#include <QSettings>
#include <QToolBar>
#include <QUndoStack>
#include <QtCharts/QChartView>

namespace tauline::ui {

namespace {

QIcon icon(const char* name)
{
    return QIcon(QStringLiteral(":/resources/icons/%1.svg").arg(QLatin1String(name)));
}

}  // namespace

void MainWindow::buildActions()
{
    buildFileMenu();
    buildEditMenu();
    buildDrawMenu();
    buildViewMenu();
    buildHelpMenu();
    buildToolBars();
}

void MainWindow::buildFileMenu()
{
    fileMenu_ = menuBar()->addMenu(tr("&File"));
    QMenu* file = fileMenu_;
    newAction_ = file->addAction(icon("new"), tr("&New"), this, &MainWindow::newFile);
    newAction_->setObjectName(QStringLiteral("newAction"));
    newAction_->setShortcut(QKeySequence::New);
    openAction_ = file->addAction(icon("open"), tr("&Open…"), this, &MainWindow::openWithDialog);
    openAction_->setObjectName(QStringLiteral("openAction"));
    openAction_->setShortcut(QKeySequence::Open);
    recentMenu_ = file->addMenu(tr("Open &Recent"));
    connect(recentMenu_, &QMenu::aboutToShow, this, &MainWindow::rebuildRecentMenu);
    file->addSeparator();
    saveAction_ = file->addAction(icon("save"), tr("&Save"), this, &MainWindow::save);
    saveAction_->setObjectName(QStringLiteral("saveAction"));
    saveAction_->setShortcut(QKeySequence::Save);
    QAction* saveAsAction = file->addAction(tr("Save &As…"), this, &MainWindow::saveAs);
    saveAsAction->setObjectName(QStringLiteral("saveAsAction"));
    saveAsAction->setShortcut(QKeySequence::SaveAs);

    // Export.
    file->addSeparator();
    svgAction_ = file->addAction(icon("export-svg"), tr("Export Plot as S&VG…"), this,
                                 [this] { exportPlot(true); });
    svgAction_->setObjectName(QStringLiteral("exportSvgAction"));
    QAction* pngAction = file->addAction(tr("Export Plot as &PNG…"), this, [this] { exportPlot(false); });
    pngAction->setObjectName(QStringLiteral("exportPngAction"));
    QAction* reviewAction = file->addAction(tr("Export &Review Page…"), this, [this] {
        if (const auto outcome = exportReviewPage(this, *document_, *plot_->chart()))
            setStatus(outcome->message, outcome->problem);
    });
    reviewAction->setObjectName(QStringLiteral("exportReviewPageAction"));

    file->addSeparator();
    QAction* quitAction = file->addAction(tr("&Quit"), this, &QWidget::close);
    quitAction->setObjectName(QStringLiteral("quitAction"));
    quitAction->setShortcut(QKeySequence::Quit);
    quitAction->setMenuRole(QAction::QuitRole);
}

void MainWindow::buildEditMenu()
{
    editMenu_ = menuBar()->addMenu(tr("&Edit"));
    undoAction_ = document_->undoStack()->createUndoAction(this, tr("&Undo"));
    undoAction_->setObjectName(QStringLiteral("undoAction"));
    undoAction_->setShortcut(QKeySequence::Undo);
    undoAction_->setIcon(icon("undo"));
    redoAction_ = document_->undoStack()->createRedoAction(this, tr("&Redo"));
    redoAction_->setObjectName(QStringLiteral("redoAction"));
    redoAction_->setShortcut(QKeySequence::Redo);
    redoAction_->setIcon(icon("redo"));
    editMenu_->addAction(undoAction_);
    editMenu_->addAction(redoAction_);
    editMenu_->addSeparator();
    editMenu_->addActions(document_->editActions());
    // The corner table as CSV or Markdown (also in the table's context menu).
    editMenu_->addSeparator();
    auto* cornerCopy = new CornerTableCopy(corners_);
    editMenu_->addAction(cornerCopy->csvAction());
    editMenu_->addAction(cornerCopy->markdownAction());
}

void MainWindow::buildDrawMenu()
{
    drawMenu_ = menuBar()->addMenu(tr("&Draw"));
    drawMenu_->addActions(document_->toolActions());
}

void MainWindow::buildViewMenu()
{
    viewMenu_ = menuBar()->addMenu(tr("&View"));
    QMenu* view = viewMenu_;
    view->addActions(canvas_->viewActions());
    view->addSeparator();
    phaseAction_ = view->addAction(icon("phase"), tr("Show &Phase"));
    phaseAction_->setObjectName(QStringLiteral("phaseAction"));
    phaseAction_->setCheckable(true);
    connect(phaseAction_, &QAction::toggled, this, [this](bool on) {
        plot_->setPhaseVisible(on);
        QSettings().setValue("view/phase", on);
    });
    QAction* pairsAction = view->addAction(tr("Close Corners as One &Quadratic"));
    pairsAction->setObjectName(QStringLiteral("pairsAsOneCornerAction"));
    pairsAction->setToolTip(tr("Draw two corners too close for their estimates as one "
                               "40 dB/decade corner at their geometric mean"));
    pairsAction->setCheckable(true);
    pairsAction->setChecked(QSettings().value("view/pairsAsOneCorner", false).toBool());
    plot_->chart()->setPairsAsOneCorner(pairsAction->isChecked());
    connect(pairsAction, &QAction::toggled, this, [this](bool on) {
        plot_->chart()->setPairsAsOneCorner(on);
        QSettings().setValue("view/pairsAsOneCorner", on);
    });
    view->addSeparator();
    fitAction_ = view->addAction(icon("fit-range"), tr("&Fit Range to Corners"), this,
                                 &MainWindow::fitFrequencyRange);
    fitAction_->setObjectName(QStringLiteral("fitRangeAction"));
    fitAction_->setToolTip(tr("Let the plot cover every corner with a decade to spare"));
    QAction* rangeAction = view->addAction(tr("Frequency &Range…"), this, &MainWindow::chooseFrequencyRange);
    rangeAction->setObjectName(QStringLiteral("frequencyRangeAction"));

    // A kept curve to compare edits with (also in the plot's context menu).
    view->addSeparator();
    auto* reference = new ReferenceCurveActions(plot_->chart(), this);
    reference->addTo(plot_->chartView());
    view->addAction(reference->keepAction());
    view->addAction(reference->dismissAction());

    // Sensitivities and placing corners (SensitivityView, PlacementPanel):
    // tool windows of their own; the corner table's menu, a drag of a
    // corner's marker and a double-click in the heat map open the panel.
    view->addSeparator();
    auto placement = [this](int corner, std::optional<double> hz) {
        PlacementPanel* panel = PlacementPanel::of(this, document_);
        panel->show();
        panel->raise();
        panel->request(corner, hz);
    };
    QAction* sensitivityAction = view->addAction(tr("Corner &Sensitivities…"), this, [this] {
        SensitivityView* sensitivities = SensitivityView::of(this, document_);
        sensitivities->show();
        sensitivities->raise();
    });
    sensitivityAction->setObjectName(QStringLiteral("sensitivityViewAction"));
    QAction* placeAction = view->addAction(tr("&Place a Corner…"), this, [this, placement] {
        placement(corners_->selectedCorner() >= 0 ? corners_->selectedCorner() : 0, std::nullopt);
    });
    placeAction->setObjectName(QStringLiteral("placeCornerAction"));
    connect(corners_, &CornerTable::placementRequested, this, [placement](int corner) { placement(corner, std::nullopt); });
    new PlacementDrag(plot_->chartView(), plot_->chart());
    connect(plot_->chart(), &BodeChart::cornerDragged, this, placement);
    connect(SensitivityView::of(this, document_), &SensitivityView::placeRequested, this,
            [this](int corner, const QString& part) {
                PlacementPanel* panel = PlacementPanel::of(this, document_);
                panel->show();
                panel->raise();
                panel->request(corner);
                panel->partBox()->setCurrentIndex(std::max(0, panel->partBox()->findData(part)));
            });
}

void MainWindow::buildHelpMenu()
{
    helpMenu_ = menuBar()->addMenu(tr("&Help"));
    QAction* aboutAction = helpMenu_->addAction(tr("&About Tauline"), this, &MainWindow::about);
    aboutAction->setObjectName(QStringLiteral("aboutAction"));
    aboutAction->setMenuRole(QAction::AboutRole);
}

void MainWindow::buildToolBars()
{
    QToolBar* tools = addToolBar(tr("Main"));
    tools->setObjectName(QStringLiteral("mainToolBar"));
    tools->setIconSize(QSize(20, 20));
    tools->addAction(newAction_);
    tools->addAction(openAction_);
    tools->addAction(saveAction_);
    tools->addSeparator();
    tools->addAction(undoAction_);
    tools->addAction(redoAction_);
    tools->addSeparator();
    tools->addAction(phaseAction_);
    tools->addAction(fitAction_);
    tools->addAction(svgAction_);

    QToolBar* drawing = new QToolBar(tr("Draw"));
    drawing->setObjectName(QStringLiteral("drawToolBar"));
    drawing->setIconSize(QSize(22, 22));
    drawing->addActions(document_->toolActions());
    addToolBar(Qt::LeftToolBarArea, drawing);
}

void MainWindow::about()
{
    QMessageBox::about(
        this, tr("About Tauline"),
        tr("<h3>Tauline %1</h3>"
           "<p>Place poles and zeros by drawing the network: every time constant and the "
           "resistance behind it, the exact response, the corners and the parts that set them, "
           "and the straight-line sketch over the exact curve.</p>"
           "<p><b>Caution.</b> %2</p>")
            .arg(QApplication::applicationVersion(), safetyCautionText().toHtmlEscaped()));
}

}  // namespace tauline::ui
