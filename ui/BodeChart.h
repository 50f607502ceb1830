#pragma once

#include "Analysis.h"

#include <QList>
#include <QPointF>
#include <QtCharts/QChart>

#include <optional>
#include <utility>
#include <vector>

class QCategoryAxis;
class QGraphicsSimpleTextItem;
class QLineSeries;
class QScatterSeries;
class QValueAxis;

namespace tauline::ui {

class ReferenceCurve;

// The Bode chart of one analysis: the exact magnitude, the straight-line
// sketch (dashed), every corner marked and labelled, and the phase when asked
// for. The frequency axis is logarithmic: series hold x = log10(f / Hz) on a
// category axis whose labels sit on the decades ("1 k", "10 k", "1 M").
// Every series is clipped to the axis box before it is handed to Qt Charts,
// so an SVG rendering of the chart stays inside its axes.
class BodeChart : public QChart {
    Q_OBJECT
public:
    explicit BodeChart(QGraphicsItem* parent = nullptr);

    void setAnalysis(const tauline::Analysis& analysis);
    // No curve to show; the message says why (shown in the plot area).
    void showMessage(const QString& message);
    const std::optional<tauline::Analysis>& analysis() const { return analysis_; }

    // A range the user chose, or none to follow the corners.
    void setUserRange(std::optional<std::pair<double, double>> rangeHz);
    std::optional<std::pair<double, double>> userRange() const { return userRange_; }
    std::pair<double, double> rangeHz() const { return rangeHz_; }

    void setPhaseVisible(bool visible);
    bool isPhaseVisible() const { return phaseVisible_; }

    // Draw two corners too close for their estimates as one ±40 dB/decade
    // corner (StraightLineSketch.h); off: one corner per exact root.
    void setPairsAsOneCorner(bool on);
    bool pairsAsOneCorner() const { return pairsAsOneCorner_; }

    // The breakpoint (index into analysis().breakpoints) to emphasise, or -1.
    void setHighlightedCorner(int index);
    int highlightedCorner() const { return highlighted_; }

    // Everything under a frequency, for the mouse readout.
    struct Reading {
        double hz = 0.0;
        double exactDb = 0.0;
        double sketchDb = 0.0;
        double phaseDeg = 0.0;
    };
    std::optional<Reading> readingAt(double hz) const;
    // Scene position -> frequency, if the position is over the plot area.
    std::optional<double> frequencyAt(const QPointF& scenePos) const;
    // The corner whose marker lies within `radius` pixels of a scene
    // position (the nearest), for dragging a corner along the axis.
    std::optional<int> cornerAt(const QPointF& scenePos, qreal radius = 8.0) const;

signals:
    // A corner's marker was dragged to a new frequency (PlacementDrag).
    void cornerDragged(int index, double hz);

public:

    // The series, for export and tests.
    QLineSeries* exactSeries() const { return exact_; }
    QLineSeries* sketchSeries() const { return sketch_; }
    QLineSeries* phaseSeries() const { return phase_; }
    QScatterSeries* poleSeries() const { return poleMarkers_; }
    QScatterSeries* zeroSeries() const { return zeroMarkers_; }
    QList<QGraphicsSimpleTextItem*> cornerLabels() const { return labels_; }
    QString message() const;

    // Colours the export and tests can look for.
    static QColor exactColor();
    static QColor sketchColor();
    static QColor phaseColor();

    // An earlier curve to compare with: keepReference() keeps the analysis
    // shown now, drawn faintly until dismissReference(); later analyses,
    // ranges and messages leave it in place.
    void keepReference();
    void dismissReference();
    bool hasReference() const;
    ReferenceCurve* reference() const { return reference_; }

    // Curves as single paths (for SVG export) rather than the cheaper
    // segment-by-segment drawing used on screen.
    void setExportStyle(bool forExport);

    // Repositions the corner labels (after a resize or a layout pass).
    void placeCornerLabels();
    // Qt Charts lays out on posted events; this settles them at once so the
    // plot area, and the labels placed from it, are final (export, tests).
    void layOutNow();

private:
    void rebuild();
    void rebuildFrequencyAxis(double lo, double hi);
    void clearCurves();
    void setPieces(QLineSeries* main, QList<QLineSeries*>& extras,
                   const QList<QList<QPointF>>& pieces, QValueAxis* yAxis);
    QList<double> sampleHz(double fromHz, double toHz) const;

    std::optional<tauline::Analysis> analysis_;
    std::optional<std::pair<double, double>> userRange_;
    std::pair<double, double> rangeHz_{10.0, 1e6};
    bool phaseVisible_ = false;
    bool pairsAsOneCorner_ = false;
    int highlighted_ = -1;

    QCategoryAxis* frequencyAxis_ = nullptr;
    QValueAxis* magnitudeAxis_ = nullptr;
    QValueAxis* phaseAxis_ = nullptr;
    QLineSeries* minorGrid_ = nullptr;
    QLineSeries* exact_ = nullptr;
    QLineSeries* sketch_ = nullptr;
    QLineSeries* phase_ = nullptr;
    QList<QLineSeries*> exactExtras_;
    QList<QLineSeries*> sketchExtras_;
    QList<QLineSeries*> phaseExtras_;
    QScatterSeries* poleMarkers_ = nullptr;
    QScatterSeries* zeroMarkers_ = nullptr;
    QScatterSeries* highlightMarker_ = nullptr;
    // Corner index and its marker position (data coordinates), in range only.
    std::vector<std::pair<int, QPointF>> markerPoints_;
    QList<QGraphicsSimpleTextItem*> labels_;
    QGraphicsSimpleTextItem* messageItem_ = nullptr;
    ReferenceCurve* reference_ = nullptr;
};

}  // namespace tauline::ui
