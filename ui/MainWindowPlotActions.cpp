// What the menus do to the plot: export it as a picture, set its range.
#include "MainWindow.h"

#include "BodeChart.h"
#include "BodePlotView.h"
#include "FrequencyRangeDialog.h"
#include "PlotExport.h"
#include "SchematicDocument.h"

#include <QDir>
#include <QFileDialog>
#include <QFileInfo>

namespace tauline::ui {

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

}  // namespace tauline::ui
