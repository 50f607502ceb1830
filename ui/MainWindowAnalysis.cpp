// From an edit to the plot and tables: one analysis per burst of edits, run
// by the AnalysisRunner; results older than the one shown are never shown.
#include "MainWindow.h"

#include "BodePlotView.h"
#include "CornerTable.h"
#include "SchematicDocument.h"
#include "TimeConstantTable.h"

#include <utility>

namespace tauline::ui {

namespace {

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
        timeConstants_->setAnalysis(a, outcome->network);
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

}  // namespace tauline::ui
