#pragma once

#include "Analysis.h"

#include <QTreeWidget>

namespace tauline::ui {

// Every reactive part's time constant and the resistance it sees (others at
// their zero-value state, input zeroed), the same with the response nulled,
// and under each part the second-order ones with another part shorted.
// "∞" marks an infinite value, "—" one that does not exist.
class TimeConstantTable : public QTreeWidget {
    Q_OBJECT
public:
    enum Column { PartColumn, TauColumn, ResistanceColumn, NullTauColumn, NullResistanceColumn,
                  ColumnCount };
    explicit TimeConstantTable(QWidget* parent = nullptr);

    void setAnalysis(const tauline::Analysis& analysis);
    void clearConstants();
};

}  // namespace tauline::ui
