#include "TimeConstantTable.h"

#include "QuantityText.h"

#include <QHeaderView>
#include <QSet>

#include <map>

namespace tauline::ui {

TimeConstantTable::TimeConstantTable(QWidget* parent) : QTreeWidget(parent)
{
    setColumnCount(ColumnCount);
    setHeaderLabels({tr("Part"), tr("τ"), tr("R seen"), tr("τ nulled"), tr("R nulled")});
    headerItem()->setToolTip(TauColumn, tr("Time constant with the other capacitors open and "
                                           "the input zeroed"));
    headerItem()->setToolTip(NullTauColumn, tr("Time constant with the response nulled (for an "
                                               "impedance: the port shorted)"));
    setRootIsDecorated(true);
    setAlternatingRowColors(true);
    setUniformRowHeights(true);
    setSelectionMode(QAbstractItemView::SingleSelection);
    header()->setStretchLastSection(true);
    setColumnWidth(PartColumn, 72);
    setColumnWidth(TauColumn, 66);
    setColumnWidth(ResistanceColumn, 66);
    setColumnWidth(NullTauColumn, 66);
}

void TimeConstantTable::setAnalysis(const tauline::Analysis& analysis)
{
    // The null double injection does not exist for a transfer response whose
    // dc value is zero or infinite: there an empty null value is undefined,
    // elsewhere it is infinite.
    const bool nullUndefined = analysis.kind != ResponseKind::Impedance
                               && analysis.dc.kind != LimitKind::Finite;
    auto nullText = [nullUndefined](const std::optional<double>& v, bool seconds) {
        if (!v && nullUndefined)
            return kUndefinedText;
        return seconds ? secondsText(v) : ohmsText(v);
    };
    const Qt::Alignment right = Qt::AlignRight | Qt::AlignVCenter;

    // Children of each part: its second-order constants, in engine order.
    std::map<std::string, std::vector<const tauline::PairTimeConstant*>> pairs;
    for (const auto& pair : analysis.pairTimeConstants)
        pairs[pair.element].push_back(&pair);

    // A value edit keeps the parts: update the rows in place (cheap while a
    // value is dragged); anything else rebuilds the list.
    bool sameParts = topLevelItemCount() == static_cast<int>(analysis.timeConstants.size());
    for (int i = 0; sameParts && i < topLevelItemCount(); ++i) {
        const auto& tc = analysis.timeConstants[i];
        sameParts = topLevelItem(i)->text(PartColumn) == QString::fromStdString(tc.element)
                    && topLevelItem(i)->childCount() == static_cast<int>(pairs[tc.element].size());
    }
    if (!sameParts) {
        QSet<QString> expanded;
        for (int i = 0; i < topLevelItemCount(); ++i)
            if (topLevelItem(i)->isExpanded())
                expanded.insert(topLevelItem(i)->text(PartColumn));
        clear();
        for (const auto& tc : analysis.timeConstants) {
            auto* row = new QTreeWidgetItem(this);
            const QString name = QString::fromStdString(tc.element);
            row->setText(PartColumn, name);
            for (int c = TauColumn; c < ColumnCount; ++c)
                row->setTextAlignment(c, right);
            row->setToolTip(TauColumn, tr("%1's time constant with every other reactive part at its "
                                          "zero-value state and the input zeroed")
                                           .arg(name));
            row->setToolTip(NullTauColumn, tr("The same with the response nulled (for an impedance: "
                                              "the port shorted)"));
            for (std::size_t k = 0; k < pairs[tc.element].size(); ++k) {
                auto* child = new QTreeWidgetItem(row);
                child->setTextAlignment(TauColumn, right);
                child->setTextAlignment(ResistanceColumn, right);
                child->setForeground(PartColumn, QColor(0x60, 0x66, 0x70));
            }
            row->setExpanded(expanded.contains(name));
        }
    }

    for (int i = 0; i < topLevelItemCount(); ++i) {
        QTreeWidgetItem* row = topLevelItem(i);
        const auto& tc = analysis.timeConstants[i];
        row->setText(TauColumn, secondsText(tc.tau));
        row->setText(ResistanceColumn, ohmsText(tc.r));
        row->setText(NullTauColumn, nullText(tc.tauNull, true));
        row->setText(NullResistanceColumn, nullText(tc.rNull, false));
        const auto& children = pairs[tc.element];
        for (int k = 0; k < row->childCount(); ++k) {
            QTreeWidgetItem* child = row->child(k);
            const tauline::PairTimeConstant& pair = *children[k];
            child->setText(PartColumn, tr("with %1 shorted").arg(QString::fromStdString(pair.shorted)));
            child->setText(TauColumn, secondsText(pair.tau));
            child->setText(ResistanceColumn, ohmsText(pair.r));
        }
    }
}

void TimeConstantTable::clearConstants()
{
    clear();
}

}  // namespace tauline::ui
