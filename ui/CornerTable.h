#pragma once

#include "Analysis.h"
#include "CornerSensitivity.h"

#include <QStringList>
#include <QTableWidget>

#include <vector>

namespace tauline::ui {

// One row per corner of the straight-line sketch, low to high: the exact
// frequency, pole or zero, the estimate from the time constants and its
// error, a flag where the corners are too close for the estimate, and the
// parts that set the corner most (largest |d ln f / d ln x|).
class CornerTable : public QTableWidget {
    Q_OBJECT
public:
    enum Column { FrequencyColumn, TypeColumn, EstimateColumn, ErrorColumn, SeparationColumn,
                  PartsColumn, ColumnCount };
    // Item data: the corner's exact frequency and estimate in Hz, and the
    // dominant parts, for anyone reading the table without parsing text.
    static constexpr int HzRole = Qt::UserRole;
    static constexpr int PartsRole = Qt::UserRole + 1;

    explicit CornerTable(QWidget* parent = nullptr);

    void setAnalysis(const tauline::Analysis& analysis);
    void setSensitivities(const std::vector<tauline::CornerSensitivity>& sensitivities);
    void clearCorners();

    int selectedCorner() const;
    void selectCorner(int index);
    QStringList partsForCorner(int index) const;

signals:
    // index -1 when the selection is cleared.
    void cornerSelected(int index, const QStringList& parts);
    // "Place This Corner…" from the context menu (an action of the table,
    // shown with the table's other actions), for the selected corner.
    void placementRequested(int index);

private:
    void emitSelection();
    std::vector<QStringList> parts_;
};

}  // namespace tauline::ui
