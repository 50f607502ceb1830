#pragma once

#include "AnalysisRunner.h"

#include <QMainWindow>

#include <memory>

class QAction;
class QLabel;
class QMenu;
class QSplitter;

namespace tauline::ui {

class BodePlotView;
class CornerTable;
class Inspector;
class SchematicDocument;
class SchematicView;
class TimeConstantTable;

// The editor: the canvas with the Bode plot beside it, the corners and time
// constants below, the inspector at the side. Every edit of the drawing
// re-runs the analysis and redraws the plot and tables.
// One class, its definitions split by job: MainWindow.cpp wires the parts
// together; the other MainWindow*.cpp files are named after what they do
// (menus and actions live in MainWindowMenus.cpp).
class MainWindow : public QMainWindow {
    Q_OBJECT
public:
    explicit MainWindow(QWidget* parent = nullptr);
    ~MainWindow() override;

    // Opens without asking about unsaved changes (the caller decided).
    bool openFile(const QString& path, QString* error = nullptr);
    // The network the editor starts on when no file is given (a sample of
    // our own, compiled in), as an untitled document.
    void openStartupSample();

    SchematicDocument* document() const { return document_; }
    AnalysisRunner* runner() const { return runner_; }
    BodePlotView* plot() const { return plot_; }
    CornerTable* cornerTable() const { return corners_; }
    TimeConstantTable* timeConstantTable() const { return timeConstants_; }
    Inspector* inspector() const { return inspector_; }
    SchematicView* canvas() const { return canvas_; }
    QLabel* cautionBanner() const { return banner_; }
    QString statusText() const;
    // The generation of the analysis the views show (0: none yet).
    quint64 shownGeneration() const { return shownGeneration_; }
    // True while an edit waits for its analysis (scheduled or running).
    bool isAnalysisPending() const;
    // The generation whose part sensitivities the corner table shows.
    quint64 shownSensitivityGeneration() const { return shownSensitivities_; }

    // Analyse the drawing as it is now, without waiting for the event loop.
    void analyseNow();

signals:
    // After the plot and tables show a new analysis (or a message instead).
    void viewsUpdated(quint64 generation);

protected:
    void closeEvent(QCloseEvent* event) override;
    void showEvent(QShowEvent* event) override;

private:
    // MainWindowLayout.cpp: the widgets, their arrangement, settings, title.
    void buildViews();
    void restoreSettings();
    void saveSettings() const;
    void updateTitle();
    void updateCaution();
    void setStatus(const QString& text, bool problem);

    // MainWindowMenus.cpp: every menu, toolbar and action (add new ones there).
    void buildActions();
    void buildFileMenu();
    void buildEditMenu();
    void buildDrawMenu();
    void buildViewMenu();
    void buildHelpMenu();
    void buildToolBars();
    void about();

    // MainWindowFileActions.cpp: new, open, save, recent files.
    bool maybeSave();
    void newFile();
    void openWithDialog();
    bool save();
    bool saveAs();
    void addRecentFile(const QString& path);
    void rebuildRecentMenu();

    // MainWindowPlotActions.cpp: export and the frequency range.
    void exportPlot(bool svg);
    void chooseFrequencyRange();
    void fitFrequencyRange();

    // MainWindowAnalysis.cpp: from an edit to the plot and tables.
    void scheduleAnalysis();
    void showOutcome(std::shared_ptr<const AnalysisOutcome> outcome);
    void showSensitivities(quint64 generation,
                           std::shared_ptr<const std::vector<tauline::CornerSensitivity>> s);
    void showCleared(const QString& reason);
    void cornerSelected(int index, const QStringList& parts);

    SchematicDocument* document_ = nullptr;
    AnalysisRunner* runner_ = nullptr;
    SchematicView* canvas_ = nullptr;
    BodePlotView* plot_ = nullptr;
    CornerTable* corners_ = nullptr;
    TimeConstantTable* timeConstants_ = nullptr;
    Inspector* inspector_ = nullptr;
    QSplitter* splitter_ = nullptr;
    QLabel* banner_ = nullptr;
    QLabel* status_ = nullptr;
    QMenu* fileMenu_ = nullptr;
    QMenu* editMenu_ = nullptr;
    QMenu* drawMenu_ = nullptr;
    QMenu* viewMenu_ = nullptr;
    QMenu* helpMenu_ = nullptr;
    QMenu* recentMenu_ = nullptr;
    // Shared by the menus and the main toolbar.
    QAction* newAction_ = nullptr;
    QAction* openAction_ = nullptr;
    QAction* saveAction_ = nullptr;
    QAction* svgAction_ = nullptr;
    QAction* undoAction_ = nullptr;
    QAction* redoAction_ = nullptr;
    QAction* phaseAction_ = nullptr;
    QAction* fitAction_ = nullptr;
    bool analysisScheduled_ = false;
    bool shownOnce_ = false;
    bool viewFromFile_ = false;
    QStringList loadNotes_;
    quint64 shownGeneration_ = 0;
    quint64 shownSensitivities_ = 0;
};

}  // namespace tauline::ui
