#include "MainWindow.h"

#include "BodeChart.h"
#include "BodePlotView.h"
#include "CornerTable.h"
#include "FrequencyRangeDialog.h"
#include "Errors.h"
#include "Inspector.h"
#include "NetworkFile.h"
#include "PlotExport.h"
#include "SafetyCaution.h"
#include "SchematicDocument.h"
#include "SchematicView.h"
#include "TimeConstantTable.h"

#include <QAction>
#include <QApplication>
#include <QCloseEvent>
#include <QDir>
#include <QDockWidget>
#include <QFile>
#include <QFileDialog>
#include <QFileInfo>
#include <utility>
#include <QLabel>
#include <QMenuBar>
#include <QMessageBox>
#include <QSettings>
#include <QSplitter>
#include <QStatusBar>
#include <QToolBar>
#include <QUndoStack>
#include <QVBoxLayout>

namespace tauline::ui {

namespace {

const char* const kRecentKey = "recentFiles";
constexpr int kMaxRecent = 8;
const char* const kStartupSample = ":/samples/start.tauline";
// Bumped when the docks change, so an older saved arrangement is not used.
constexpr int kWindowStateVersion = 2;

QIcon icon(const char* name)
{
    return QIcon(QStringLiteral(":/resources/icons/%1.svg").arg(QLatin1String(name)));
}

QString summaryOf(const tauline::Analysis& a)
{
    int poles = 0;
    int zeros = 0;
    for (const auto& corner : a.breakpoints)
        (corner.type == RootType::Pole ? poles : zeros) += corner.q ? 2 : 1;
    QString text = QObject::tr("Order %1 · %2 corner(s): %3 pole(s), %4 zero(s)")
                       .arg(a.order)
                       .arg(a.breakpoints.size())
                       .arg(poles)
                       .arg(zeros);
    if (a.originPower > 0)
        text += QObject::tr(" · %1 zero(s) at the origin").arg(a.originPower);
    else if (a.originPower < 0)
        text += QObject::tr(" · %1 pole(s) at the origin").arg(-a.originPower);
    return text;
}

}  // namespace

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
        if (busy)
            setStatus(tr("Analysing…"), false);
    });
    connect(corners_, &CornerTable::cornerSelected, this, &MainWindow::cornerSelected);
    connect(plot_, &BodePlotView::cornerClicked, corners_, &CornerTable::selectCorner);

    updateTitle();
    updateCaution();
    analyseNow();
}

MainWindow::~MainWindow() = default;

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
    tauDock->setWidget(timeConstants_);
    addDockWidget(Qt::BottomDockWidgetArea, tauDock);
    splitDockWidget(cornerDock, tauDock, Qt::Horizontal);

    // Canvas and plot across the top, the part and the numbers beneath.
    resizeDocks({cornerDock}, {230}, Qt::Vertical);
    resizeDocks({inspectorDock, cornerDock, tauDock}, {250, 610, 380}, Qt::Horizontal);

    status_ = new QLabel;
    status_->setTextFormat(Qt::PlainText);
    statusBar()->addWidget(status_, 1);
}

void MainWindow::buildActions()
{
    QMenu* file = menuBar()->addMenu(tr("&File"));
    QAction* newAction = file->addAction(icon("new"), tr("&New"), this, &MainWindow::newFile);
    newAction->setShortcut(QKeySequence::New);
    QAction* openAction = file->addAction(icon("open"), tr("&Open…"), this, &MainWindow::openWithDialog);
    openAction->setShortcut(QKeySequence::Open);
    recentMenu_ = file->addMenu(tr("Open &Recent"));
    connect(recentMenu_, &QMenu::aboutToShow, this, &MainWindow::rebuildRecentMenu);
    file->addSeparator();
    QAction* saveAction = file->addAction(icon("save"), tr("&Save"), this, &MainWindow::save);
    saveAction->setShortcut(QKeySequence::Save);
    QAction* saveAsAction = file->addAction(tr("Save &As…"), this, &MainWindow::saveAs);
    saveAsAction->setShortcut(QKeySequence::SaveAs);
    file->addSeparator();
    QAction* svgAction = file->addAction(icon("export-svg"), tr("Export Plot as S&VG…"), this,
                                         [this] { exportPlot(true); });
    QAction* pngAction = file->addAction(tr("Export Plot as &PNG…"), this, [this] { exportPlot(false); });
    Q_UNUSED(pngAction);
    file->addSeparator();
    QAction* quitAction = file->addAction(tr("&Quit"), this, &QWidget::close);
    quitAction->setShortcut(QKeySequence::Quit);
    quitAction->setMenuRole(QAction::QuitRole);

    QMenu* edit = menuBar()->addMenu(tr("&Edit"));
    QAction* undo = document_->undoStack()->createUndoAction(this, tr("&Undo"));
    undo->setShortcut(QKeySequence::Undo);
    undo->setIcon(icon("undo"));
    QAction* redo = document_->undoStack()->createRedoAction(this, tr("&Redo"));
    redo->setShortcut(QKeySequence::Redo);
    redo->setIcon(icon("redo"));
    edit->addAction(undo);
    edit->addAction(redo);
    edit->addSeparator();
    edit->addActions(document_->editActions());

    QMenu* draw = menuBar()->addMenu(tr("&Draw"));
    draw->addActions(document_->toolActions());

    QMenu* view = menuBar()->addMenu(tr("&View"));
    view->addActions(canvas_->viewActions());
    view->addSeparator();
    phaseAction_ = view->addAction(icon("phase"), tr("Show &Phase"));
    phaseAction_->setCheckable(true);
    connect(phaseAction_, &QAction::toggled, this, [this](bool on) {
        plot_->setPhaseVisible(on);
        QSettings().setValue("view/phase", on);
    });
    view->addSeparator();
    fitAction_ = view->addAction(icon("fit-range"), tr("&Fit Range to Corners"), this,
                                 &MainWindow::fitFrequencyRange);
    fitAction_->setToolTip(tr("Let the plot cover every corner with a decade to spare"));
    view->addAction(tr("Frequency &Range…"), this, &MainWindow::chooseFrequencyRange);

    QMenu* help = menuBar()->addMenu(tr("&Help"));
    QAction* aboutAction = help->addAction(tr("&About Tauline"), this, &MainWindow::about);
    aboutAction->setMenuRole(QAction::AboutRole);

    QToolBar* tools = addToolBar(tr("Main"));
    tools->setObjectName(QStringLiteral("mainToolBar"));
    tools->setIconSize(QSize(20, 20));
    tools->addAction(newAction);
    tools->addAction(openAction);
    tools->addAction(saveAction);
    tools->addSeparator();
    tools->addAction(undo);
    tools->addAction(redo);
    tools->addSeparator();
    tools->addAction(phaseAction_);
    tools->addAction(fitAction_);
    tools->addAction(svgAction);

    QToolBar* drawing = new QToolBar(tr("Draw"));
    drawing->setObjectName(QStringLiteral("drawToolBar"));
    drawing->setIconSize(QSize(22, 22));
    drawing->addActions(document_->toolActions());
    addToolBar(Qt::LeftToolBarArea, drawing);
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

bool MainWindow::maybeSave()
{
    if (!document_->isModified())
        return true;
    const auto answer = QMessageBox::warning(
        this, tr("Unsaved Changes"),
        tr("The network has changes that are not saved. Save them first?"),
        QMessageBox::Save | QMessageBox::Discard | QMessageBox::Cancel, QMessageBox::Save);
    if (answer == QMessageBox::Save)
        return save();
    return answer == QMessageBox::Discard;
}

void MainWindow::newFile()
{
    if (!maybeSave())
        return;
    document_->loadNetwork(tauline::Network{}, nullptr);
    updateTitle();
    updateCaution();
}

bool MainWindow::openFile(const QString& path, QString* error)
{
    QString message;
    if (!document_->openFile(path, &message)) {
        setStatus(message, true);
        if (error)
            *error = message;
        return false;
    }
    addRecentFile(QFileInfo(path).absoluteFilePath());
    updateTitle();
    updateCaution();
    loadNotes_ = document_->loadWarnings();
    viewFromFile_ = !isVisible() && document_->hasViewState();
    return true;
}

void MainWindow::openStartupSample()
{
    QFile file(QString::fromLatin1(kStartupSample));
    if (!file.open(QIODevice::ReadOnly))
        return;
    const std::string text = file.readAll().toStdString();
    try {
        const tauline::LoadedNetwork loaded = tauline::parseNetworkText(text, "start-up sample");
        document_->loadNetwork(loaded.network, loaded.drawing);
    } catch (const tauline::InputError& error) {
        setStatus(QString::fromStdString(error.what()), true);
    }
    updateTitle();
    updateCaution();
}

void MainWindow::openWithDialog()
{
    if (!maybeSave())
        return;
    const QString path = QFileDialog::getOpenFileName(
        this, tr("Open Network"), QFileInfo(document_->filePath()).absolutePath(),
        tr("Tauline networks (*.tauline);;All files (*)"));
    if (!path.isEmpty())
        openFile(path);
}

bool MainWindow::save()
{
    if (document_->filePath().isEmpty())
        return saveAs();
    QString error;
    if (!document_->saveFile(document_->filePath(), &error)) {
        setStatus(error, true);
        return false;
    }
    setStatus(tr("Saved %1").arg(QDir::toNativeSeparators(document_->filePath())), false);
    return true;
}

bool MainWindow::saveAs()
{
    QString suggestion = document_->filePath();
    if (suggestion.isEmpty())
        suggestion = (document_->title().isEmpty() ? tr("network") : document_->title())
                     + QStringLiteral(".tauline");
    QString path = QFileDialog::getSaveFileName(this, tr("Save Network"), suggestion,
                                                tr("Tauline networks (*.tauline)"));
    if (path.isEmpty())
        return false;
    if (QFileInfo(path).suffix().isEmpty())
        path += QStringLiteral(".tauline");
    QString error;
    if (!document_->saveFile(path, &error)) {
        setStatus(error, true);
        return false;
    }
    addRecentFile(QFileInfo(path).absoluteFilePath());
    updateTitle();
    setStatus(tr("Saved %1").arg(QDir::toNativeSeparators(path)), false);
    return true;
}

void MainWindow::exportPlot(bool svg)
{
    if (!plot_->chart()->analysis()) {
        setStatus(tr("There is no plot to export yet."), true);
        return;
    }
    const QString suffix = svg ? QStringLiteral("svg") : QStringLiteral("png");
    QString base = document_->filePath().isEmpty()
                       ? (document_->title().isEmpty() ? tr("bode-plot") : document_->title())
                       : QFileInfo(document_->filePath()).completeBaseName();
    QString path = QFileDialog::getSaveFileName(
        this, svg ? tr("Export Plot as SVG") : tr("Export Plot as PNG"), base + '.' + suffix,
        svg ? tr("SVG images (*.svg)") : tr("PNG images (*.png)"));
    if (path.isEmpty())
        return;
    if (QFileInfo(path).suffix().isEmpty())
        path += '.' + suffix;
    const PlotSnapshot snapshot = snapshotOf(*plot_->chart(), document_->title());
    QString error;
    const bool ok = svg ? writePlotSvg(snapshot, path, &error) : writePlotPng(snapshot, path, &error);
    if (ok)
        setStatus(tr("Plot written to %1").arg(QDir::toNativeSeparators(path)), false);
    else
        setStatus(error, true);
}

void MainWindow::chooseFrequencyRange()
{
    BodeChart* chart = plot_->chart();
    FrequencyRangeDialog dialog(chart->rangeHz(), chart->userRange().has_value(), this);
    if (dialog.exec() == QDialog::Accepted)
        plot_->setUserRange(dialog.range());
}

void MainWindow::fitFrequencyRange()
{
    plot_->setUserRange(std::nullopt);
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

void MainWindow::addRecentFile(const QString& path)
{
    QSettings settings;
    QStringList files = settings.value(kRecentKey).toStringList();
    files.removeAll(path);
    files.prepend(path);
    while (files.size() > kMaxRecent)
        files.removeLast();
    settings.setValue(kRecentKey, files);
}

void MainWindow::rebuildRecentMenu()
{
    recentMenu_->clear();
    QStringList files = QSettings().value(kRecentKey).toStringList();
    files.erase(std::remove_if(files.begin(), files.end(),
                               [](const QString& f) { return !QFileInfo::exists(f); }),
                files.end());
    for (int i = 0; i < files.size(); ++i) {
        const QString path = files[i];
        QAction* action = recentMenu_->addAction(
            QStringLiteral("&%1  %2").arg(i + 1).arg(QFileInfo(path).fileName()));
        action->setToolTip(path);
        connect(action, &QAction::triggered, this, [this, path] {
            if (maybeSave())
                openFile(path);
        });
    }
    if (files.isEmpty())
        recentMenu_->addAction(tr("No recent files"))->setEnabled(false);
    else {
        recentMenu_->addSeparator();
        recentMenu_->addAction(tr("Clear List"), this, [] { QSettings().remove(kRecentKey); });
    }
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

void MainWindow::scheduleAnalysis()
{
    // One analysis per burst of edits (a paste emits several changes).
    if (analysisScheduled_)
        return;
    analysisScheduled_ = true;
    QMetaObject::invokeMethod(
        this, [this] {
            if (analysisScheduled_)
                analyseNow();
        },
        Qt::QueuedConnection);
}

void MainWindow::analyseNow()
{
    analysisScheduled_ = false;
    if (!document_->hasResponse()) {
        const auto problems = document_->problems();
        runner_->clear(problems.isEmpty()
                           ? tr("Place a port, or an input and an output, to see the response.")
                           : problems.front().message);
        return;
    }
    runner_->request(document_->network());
}

void MainWindow::showOutcome(std::shared_ptr<const AnalysisOutcome> outcome)
{
    if (outcome->analysis) {
        const tauline::Analysis& a = *outcome->analysis;
        plot_->setAnalysis(a);
        corners_->setAnalysis(a);
        timeConstants_->setAnalysis(a);
        QString text = summaryOf(a);
        for (const auto& warning : a.warnings)
            text += QStringLiteral(" · ") + QString::fromStdString(warning);
        // What the last open had to say, until the next edit.
        for (const QString& note : std::exchange(loadNotes_, {}))
            text += QStringLiteral(" · ") + note;
        setStatus(text, false);
    } else {
        plot_->showMessage(outcome->error);
        corners_->clearCorners();
        timeConstants_->clearConstants();
        setStatus(outcome->error, true);
    }
    shownGeneration_ = outcome->generation;
    emit viewsUpdated(shownGeneration_);
}

void MainWindow::showSensitivities(quint64 generation,
                                   std::shared_ptr<const std::vector<tauline::CornerSensitivity>> s)
{
    if (generation != shownGeneration_)
        return;
    corners_->setSensitivities(*s);
    shownSensitivities_ = generation;
}

bool MainWindow::isAnalysisPending() const
{
    return analysisScheduled_ || runner_->isBusy() || shownGeneration_ != runner_->generation();
}

void MainWindow::showCleared(const QString& reason)
{
    plot_->showMessage(reason);
    corners_->clearCorners();
    timeConstants_->clearConstants();
    setStatus(reason, false);
    shownGeneration_ = runner_->generation();
    emit viewsUpdated(shownGeneration_);
}

void MainWindow::cornerSelected(int index, const QStringList& parts)
{
    document_->highlightParts(parts);
    plot_->highlightCorner(index);
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
