#pragma once

#include "Analysis.h"
#include "Network.h"
#include "ResistanceExpressions.h"

#include "FactoredFormText.h"

#include <QPointer>
#include <QTreeWidget>

#include <utility>
#include <vector>


namespace tauline::ui {

// Every reactive part's time constant and the resistance it sees (others at
// their zero-value state, input zeroed), the same with the response nulled,
// and under each part the second-order ones with another part shorted.
// "∞" marks an infinite value, "—" one that does not exist. Given the
// network too, each time constant is also written in part names
// ("C2 · (R4 ∥ (R2 + R3))") and the response in factored form, shown by
// factoredLabel(). Copy (the standard shortcut, or the context menu) puts
// all of it on the clipboard as plain text.
class TimeConstantTable : public QTreeWidget {
    Q_OBJECT
public:
    enum Column { PartColumn, TauColumn, ResistanceColumn, NullTauColumn, NullResistanceColumn,
                  ExpressionColumn, NullExpressionColumn, ColumnCount };
    explicit TimeConstantTable(QWidget* parent = nullptr);
    ~TimeConstantTable() override;

    void setAnalysis(const tauline::Analysis& analysis);
    // As above, plus the expressions and the factored form.
    void setAnalysis(const tauline::Analysis& analysis, const tauline::Network& network);
    void clearConstants();

    // The factored response, for the window to place under the list; the
    // table keeps it up to date (and deletes it if nobody placed it).
    FactoredFormText* factoredLabel() const { return factored_; }
    // The list and the factored form as tab-separated plain text.
    QString plainText() const;
    void copyAsText() const;

private:
    // The numbers of every row (rows kept while the parts stay the same);
    // the expression columns and the factored form are left as they are.
    void updateRows(const tauline::Analysis& analysis);
    // The expressions depend on the drawing's shape, not on part values:
    // while a value is dragged they are reused.
    const std::vector<tauline::TimeConstantExpression>& expressionsFor(const tauline::Analysis& analysis,
                                                                      const tauline::Network& network);
    std::string expressionKey_;
    std::vector<tauline::TimeConstantExpression> expressions_;
    // Each expression's τ and τ-nulled text, written once per shape.
    std::vector<std::pair<QString, QString>> expressionTexts_;
    QPointer<FactoredFormText> factored_;
    QString factoredText_;
};

}  // namespace tauline::ui
