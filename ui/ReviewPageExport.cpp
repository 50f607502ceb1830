#include "ReviewPageExport.h"

#include "BodeChart.h"
#include "Errors.h"
#include "SchematicDocument.h"

#include <QDir>
#include <QFileDialog>
#include <QFileInfo>

namespace tauline::ui {

std::optional<ReviewContent> reviewContentOfEditor(const SchematicDocument& document, const BodeChart& chart,
                                                   QString* why)
{
    if (!document.hasResponse()) {
        if (why)
            *why = QObject::tr("Nothing to review yet: the drawing has no response to analyse.");
        return std::nullopt;
    }
    tauline::Network network = document.network();
    network.title = document.title().toStdString();
    const QString fileName =
        document.filePath().isEmpty() ? QString() : QFileInfo(document.filePath()).fileName();
    try {
        ReviewContent content = reviewContentOf(network, drawingOf(document), fileName);
        if (content.title.isEmpty())
            content.title = QObject::tr("Untitled network");
        content.rangeHz = chart.userRange();
        return content;
    } catch (const std::exception& error) {  // InputError included
        if (why)
            *why = QString::fromStdString(error.what());
        return std::nullopt;
    }
}

std::optional<ExportOutcome> exportReviewPage(QWidget* parent, const SchematicDocument& document,
                                              const BodeChart& chart)
{
    QString why;
    const auto content = reviewContentOfEditor(document, chart, &why);
    if (!content)
        return ExportOutcome{why, true};
    const QString base = document.filePath().isEmpty()
                             ? (document.title().isEmpty() ? QObject::tr("review") : document.title())
                             : QFileInfo(document.filePath()).completeBaseName() + QObject::tr("-review");
    QString path = QFileDialog::getSaveFileName(parent, QObject::tr("Export Review Page"), base + QStringLiteral(".svg"),
                                                QObject::tr("SVG images (*.svg)"));
    if (path.isEmpty())
        return std::nullopt;
    if (QFileInfo(path).suffix().isEmpty())
        path += QStringLiteral(".svg");
    QString error;
    if (!writeReviewPageSvg(*content, path, &error))
        return ExportOutcome{error, true};
    return ExportOutcome{QObject::tr("Review page written to %1").arg(QDir::toNativeSeparators(path)), false};
}

}  // namespace tauline::ui
