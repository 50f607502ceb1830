#include "PlotExport.h"

#include "BodeChart.h"
#include "ReferenceCurve.h"
#include "SvgTextRuns.h"

#include <QBuffer>
#include <QGraphicsScene>
#include <QGuiApplication>
#include <QPainter>
#include <QSaveFile>
#include <QScreen>
#include <QSvgGenerator>

namespace tauline::ui {

namespace {

// Lays a fresh chart out at the export size and lets `draw` paint the scene.
template <typename Draw>
void withChart(const PlotSnapshot& snapshot, QSize size, Draw draw)
{
    QGraphicsScene scene;
    auto* chart = new BodeChart;
    scene.addItem(chart);
    chart->setExportStyle(true);
    chart->setTitle(snapshot.title);
    chart->setPhaseVisible(snapshot.phaseVisible);
    chart->setUserRange(snapshot.userRangeHz);
    if (snapshot.reference) {
        chart->setAnalysis(*snapshot.reference);
        chart->keepReference();
    }
    chart->setAnalysis(snapshot.analysis);
    chart->setHighlightedCorner(snapshot.highlightedCorner);
    const QRectF rect(QPointF(0, 0), QSizeF(size));
    chart->setGeometry(rect);
    scene.setSceneRect(rect);
    chart->layOutNow();
    draw(scene, rect);
}

}  // namespace

PlotSnapshot snapshotOf(const BodeChart& chart, const QString& title)
{
    PlotSnapshot s;
    if (chart.analysis())
        s.analysis = *chart.analysis();
    s.userRangeHz = chart.userRange();
    s.phaseVisible = chart.isPhaseVisible();
    s.highlightedCorner = chart.highlightedCorner();
    if (chart.hasReference())
        s.reference = chart.reference()->analysis();
    s.title = title;
    return s;
}

QByteArray plotSvg(const PlotSnapshot& snapshot, QSize size)
{
    QByteArray bytes;
    QBuffer buffer(&bytes);
    buffer.open(QIODevice::WriteOnly);
    QSvgGenerator svg;
    svg.setOutputDevice(&buffer);
    // The resolution the chart lays its text out for (the screen's), so the
    // font sizes written are the ones the text was placed with.
    const QScreen* screen = QGuiApplication::primaryScreen();
    svg.setResolution(screen ? qRound(screen->logicalDotsPerInchY()) : 96);
    svg.setSize(size);
    svg.setViewBox(QRect(QPoint(0, 0), size));
    svg.setTitle(snapshot.title.isEmpty() ? QStringLiteral("Bode plot") : snapshot.title);
    svg.setDescription(QStringLiteral("Bode plot drawn by Tauline: exact magnitude and "
                                      "straight-line sketch with the corners marked"));
    withChart(snapshot, size, [&](QGraphicsScene& scene, const QRectF& rect) {
        QPainter painter(&svg);
        painter.setRenderHint(QPainter::Antialiasing);
        scene.render(&painter, rect, rect);
    });
    return joinScriptRuns(bytes);
}

QImage plotImage(const PlotSnapshot& snapshot, QSize size, qreal scale)
{
    QImage image(size * scale, QImage::Format_ARGB32_Premultiplied);
    image.setDevicePixelRatio(scale);
    image.fill(Qt::white);
    withChart(snapshot, size, [&](QGraphicsScene& scene, const QRectF& rect) {
        QPainter painter(&image);
        painter.setRenderHint(QPainter::Antialiasing);
        painter.setRenderHint(QPainter::TextAntialiasing);
        scene.render(&painter, rect, rect);
    });
    return image;
}

bool writeFileAtomically(const QString& path, const QByteArray& bytes, QString* error)
{
    QSaveFile file(path);
    if (!file.open(QIODevice::WriteOnly) || file.write(bytes) != bytes.size() || !file.commit()) {
        if (error)
            *error = QObject::tr("%1: cannot write: %2").arg(path, file.errorString());
        file.cancelWriting();
        return false;
    }
    return true;
}

bool writePlotSvg(const PlotSnapshot& snapshot, const QString& path, QString* error)
{
    const QByteArray bytes = plotSvg(snapshot);
    if (bytes.isEmpty()) {
        if (error)
            *error = QObject::tr("%1: the plot could not be drawn").arg(path);
        return false;
    }
    return writeFileAtomically(path, bytes, error);
}

bool writePlotPng(const PlotSnapshot& snapshot, const QString& path, QString* error)
{
    QByteArray bytes;
    QBuffer buffer(&bytes);
    buffer.open(QIODevice::WriteOnly);
    if (!plotImage(snapshot).save(&buffer, "PNG")) {
        if (error)
            *error = QObject::tr("%1: the plot could not be drawn").arg(path);
        return false;
    }
    return writeFileAtomically(path, bytes, error);
}

}  // namespace tauline::ui
