#pragma once

#include "Analysis.h"
#include "CornerSensitivity.h"
#include "Network.h"

#include <QWidget>

class QLabel;
class QTableWidget;

namespace tauline::ui {

class SchematicDocument;

// Every corner against every part: the normalised sensitivity d ln f / d ln x
// as a signed heat map (rows corners low to high, columns parts; blue where
// raising the part lowers the corner, red where it raises it, the stronger
// the colour the larger |d ln f / d ln x|, full at 1). Exact values; a corner
// on a double root shows central differences, marked ≈.
class SensitivityView : public QWidget {
    Q_OBJECT
public:
    explicit SensitivityView(SchematicDocument* document, QWidget* parent = nullptr);

    // The view of a window, made on first use (a tool window of its own).
    static SensitivityView* of(QWidget* window, SchematicDocument* document);

    // Recomputes from the document's network (also on every edit while shown).
    void refresh();
    void setSensitivities(const tauline::Network& network, const tauline::Analysis& analysis,
                          const std::vector<tauline::CornerSensitivity>& sensitivities);

    QTableWidget* table() const { return table_; }
    QString caption() const;

    // Item data on each cell: the value as a double.
    static constexpr int ValueRole = Qt::UserRole;

signals:
    // A double-click on a cell: place that corner by changing that part.
    void placeRequested(int corner, const QString& part);

protected:
    void showEvent(QShowEvent* event) override;

private:
    SchematicDocument* document_;
    QLabel* caption_;
    QTableWidget* table_;
    QStringList columnParts_;
    bool refreshQueued_ = false;
};

// The heat map's colour for a sensitivity (exposed for the tests).
QColor sensitivityColor(double value);

}  // namespace tauline::ui
