#include "MainWindow.h"

#include "BodePlotView.h"
#include "CornerTable.h"
#include "SchematicDocument.h"

namespace tauline::ui {

MainWindow::MainWindow(QWidget* parent) : QMainWindow(parent)
{
    document_ = new SchematicDocument(this);
    runner_ = new AnalysisRunner(this);
    buildViews();
    buildActions();
    restoreSettings();

    connect(document_, &SchematicDocument::networkChanged, this, &MainWindow::scheduleAnalysis);
    connect(document_, &SchematicDocument::networkChanged, this, &MainWindow::updateCaution);
    connect(document_, &SchematicDocument::modifiedChanged, this, &MainWindow::updateTitle);
    connect(document_, &SchematicDocument::titleChanged, this, [this] {
        updateTitle();
        updateCaution();
    });
    connect(document_, &SchematicDocument::drawingLoaded, this, [this] {
        // A new drawing: the plot follows its corners again.
        plot_->setUserRange(std::nullopt);
        corners_->clearSelection();
    });
    connect(document_, &SchematicDocument::filePathChanged, this, [this](const QString& path) {
        updateTitle();
        updateCaution();
        if (!path.isEmpty())
            addRecentFile(path);
    });
    connect(runner_, &AnalysisRunner::analysisReady, this, &MainWindow::showOutcome);
    connect(runner_, &AnalysisRunner::sensitivitiesReady, this, &MainWindow::showSensitivities);
    connect(runner_, &AnalysisRunner::networkCleared, this, &MainWindow::showCleared);
    connect(runner_, &AnalysisRunner::busyChanged, this, [this](bool busy) {
        // Said only if the analysis outlasts this turn of the event loop: one
        // run inline is done before the window paints again, and the status
        // line would be laid out twice per edit for nothing.
        if (busy)
            QMetaObject::invokeMethod(
                this, [this] {
                    if (runner_->isBusy())
                        setStatus(tr("Analysing…"), false);
                },
                Qt::QueuedConnection);
    });
    connect(corners_, &CornerTable::cornerSelected, this, &MainWindow::cornerSelected);
    connect(plot_, &BodePlotView::cornerClicked, corners_, &CornerTable::selectCorner);

    updateTitle();
    updateCaution();
    analyseNow();
}

MainWindow::~MainWindow() = default;

}  // namespace tauline::ui
