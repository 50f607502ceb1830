#include "TimeConstantTable.h"

#include "FactoredForm.h"
#include "QuantityText.h"

#include <QAction>
#include <QApplication>
#include <QClipboard>
#include <QHeaderView>
#include <QSet>

#include <array>
#include <optional>
#include <string>

#include <map>

namespace tauline::ui {

namespace {

// A part's row. Its cells are held here and handed to the view when it
// asks: a new analysis rewrites them without a dataChanged per cell (each
// one made the view measure the row again), and the table repaints once.
class ConstantRow : public QTreeWidgetItem {
public:
    explicit ConstantRow(QTreeWidget* parent) : QTreeWidgetItem(parent) {}

    std::array<QString, TimeConstantTable::ColumnCount> cells;
    bool hasExpressions = false;
    QString expressionTip;

    QVariant data(int column, int role) const override
    {
        using T = TimeConstantTable;
        const bool inRange = column >= 0 && column < T::ColumnCount;
        if (inRange && (role == Qt::DisplayRole || role == Qt::EditRole))
            return cells[column];
        if (role == Qt::ToolTipRole && column == T::TauColumn)
            // The narrow dock may hide the expression columns: the τ cells say it too.
            return hasExpressions ? T::tr("τ = %1 = %2").arg(cells[T::ExpressionColumn], cells[T::TauColumn])
                                  : T::tr("%1's time constant with every other reactive part at its "
                                          "zero-value state and the input zeroed")
                                        .arg(cells[T::PartColumn]);
        if (role == Qt::ToolTipRole && column == T::NullTauColumn)
            return hasExpressions ? T::tr("τ nulled = %1 = %2")
                                        .arg(cells[T::NullExpressionColumn], cells[T::NullTauColumn])
                                  : T::tr("The same with the response nulled (for an impedance: "
                                          "the port shorted)");
        if (role == Qt::ToolTipRole && column == T::ExpressionColumn)
            return expressionTip;
        return QTreeWidgetItem::data(column, role);
    }
};

// A second-order constant under its part's row: written out only when the
// view asks, which it does only for a row that is expanded (n(n−1) of them,
// mostly never looked at, yet all new on every value edit).
class PairRow : public QTreeWidgetItem {
public:
    explicit PairRow(QTreeWidgetItem* parent) : QTreeWidgetItem(parent) {}

    void setPair(const tauline::PairTimeConstant& pair)
    {
        if (shorted_ == pair.shorted && tau_ == pair.tau && r_ == pair.r)
            return;
        shorted_ = pair.shorted;
        tau_ = pair.tau;
        r_ = pair.r;
        written_ = false;
    }

    QVariant data(int column, int role) const override
    {
        using T = TimeConstantTable;
        if ((role == Qt::DisplayRole || role == Qt::EditRole)
            && (column == T::PartColumn || column == T::TauColumn || column == T::ResistanceColumn)) {
            if (!written_) {
                text_ = {T::tr("with %1 shorted").arg(QString::fromStdString(shorted_)), secondsText(tau_),
                         ohmsText(r_)};
                written_ = true;
            }
            return text_[column == T::PartColumn ? 0 : column == T::TauColumn ? 1 : 2];
        }
        if (role == Qt::DisplayRole || role == Qt::EditRole)
            return QString();
        return QTreeWidgetItem::data(column, role);
    }

private:
    std::string shorted_;
    std::optional<double> tau_;
    std::optional<double> r_;
    mutable std::array<QString, 3> text_;
    mutable bool written_ = false;
};

ConstantRow* constantRow(QTreeWidgetItem* item)
{
    return static_cast<ConstantRow*>(item);
}

}  // namespace

TimeConstantTable::TimeConstantTable(QWidget* parent) : QTreeWidget(parent)
{
    setColumnCount(ColumnCount);
    setHeaderLabels({tr("Part"), tr("τ"), tr("R seen"), tr("τ nulled"), tr("R nulled"), tr("τ in part names"),
                     tr("τ nulled in part names")});
    headerItem()->setToolTip(ExpressionColumn, tr("The resistance seen, reduced series–parallel; "
                                                  "“bridge(…)” where it is not series–parallel"));
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
    setColumnWidth(NullResistanceColumn, 66);
    setColumnWidth(ExpressionColumn, 160);

    // Not mouse-selectable: selectable text is laid out again as a document
    // on every edit, which cost a third of the edit-to-redrawn time; Copy as
    // Text (also on the text's own menu) copies it instead.
    factored_ = new FactoredFormText;
    factored_->setObjectName(QStringLiteral("factoredForm"));

    auto* copy = new QAction(tr("Copy as Text"), this);
    copy->setShortcut(QKeySequence::Copy);
    copy->setShortcutContext(Qt::WidgetWithChildrenShortcut);
    connect(copy, &QAction::triggered, this, &TimeConstantTable::copyAsText);
    addAction(copy);
    setContextMenuPolicy(Qt::ActionsContextMenu);
    factored_->addAction(copy);
    factored_->setContextMenuPolicy(Qt::ActionsContextMenu);
}

TimeConstantTable::~TimeConstantTable()
{
    if (factored_ && !factored_->parent())
        delete factored_;
}

void TimeConstantTable::setAnalysis(const tauline::Analysis& analysis, const tauline::Network& network)
{
    updateRows(analysis);
    const auto& expressions = expressionsFor(analysis, network);
    const bool nullUndefined = analysis.kind != ResponseKind::Impedance && analysis.dc.kind != LimitKind::Finite;
    bool changed = false;
    for (int i = 0; i < topLevelItemCount() && i < static_cast<int>(expressions.size()); ++i) {
        ConstantRow* row = constantRow(topLevelItem(i));
        const auto& e = expressions[i];
        const QString& nullText = nullUndefined && !analysis.timeConstants[i].tauNull ? kUndefinedText
                                                                                      : expressionTexts_[i].second;
        const bool bridge = (e.seen && !e.seen->seriesParallel()) || (e.nulled && !e.nulled->seriesParallel());
        const QString tip = bridge ? tr("Not series–parallel: the bridge’s branches are reduced as "
                                        "far as they go; the value is exact")
                                   : QString();
        changed = changed || !row->hasExpressions || row->cells[ExpressionColumn] != expressionTexts_[i].first
                  || row->cells[NullExpressionColumn] != nullText || row->expressionTip != tip;
        row->hasExpressions = true;
        row->cells[ExpressionColumn] = expressionTexts_[i].first;
        row->cells[NullExpressionColumn] = nullText;
        row->expressionTip = tip;
    }
    if (changed)
        viewport()->update();
    const FactoredForm form = factoredForm(analysis, expressions);
    factoredText_ = QString::fromStdString(form.text()).trimmed();
    if (factored_ && factored_->text() != factoredText_)
        factored_->setText(factoredText_);
}

const std::vector<tauline::TimeConstantExpression>&
TimeConstantTable::expressionsFor(const tauline::Analysis& analysis, const tauline::Network& network)
{
    std::string key = std::to_string(static_cast<int>(network.response.kind));
    for (const auto& node : network.response.input)
        key += '|' + node;
    for (const auto& node : network.response.output)
        key += '|' + node;
    for (const auto& part : network.parts)
        key += ';' + part.name + ',' + std::to_string(static_cast<int>(part.kind)) + ',' + part.nodes[0] + ',' +
               part.nodes[1];
    // What the null state depends on beyond the shape.
    key += analysis.dc.kind == LimitKind::Finite && analysis.dc.value != 0.0 ? "#n" : "#-";
    for (const auto& tc : analysis.timeConstants)
        key += ';' + tc.element + (tc.rNull ? "+" : "-");
    if (key != expressionKey_) {
        expressions_ = timeConstantExpressions(network, analysis);
        expressionKey_ = std::move(key);
        expressionTexts_.clear();
        for (const auto& e : expressions_)
            expressionTexts_.emplace_back(QString::fromStdString(e.tauText()),
                                          QString::fromStdString(e.nullTauText()));
    }
    return expressions_;
}

QString TimeConstantTable::plainText() const
{
    QStringList lines;
    QStringList header;
    for (int c = 0; c < columnCount(); ++c)
        header << headerItem()->text(c);
    lines << header.join(QLatin1Char('\t'));
    auto rowText = [this](const QTreeWidgetItem* item) {
        QStringList cells;
        for (int c = 0; c < columnCount(); ++c)
            cells << item->text(c);
        while (!cells.isEmpty() && cells.back().isEmpty())
            cells.removeLast();
        return cells.join(QLatin1Char('\t'));
    };
    for (int i = 0; i < topLevelItemCount(); ++i) {
        const QTreeWidgetItem* row = topLevelItem(i);
        lines << rowText(row);
        for (int k = 0; k < row->childCount(); ++k)
            lines << rowText(row->child(k));
    }
    if (!factoredText_.isEmpty())
        lines << QString() << factoredText_;
    return lines.join(QLatin1Char('\n')) + QLatin1Char('\n');
}

void TimeConstantTable::copyAsText() const
{
    QApplication::clipboard()->setText(plainText());
}

void TimeConstantTable::setAnalysis(const tauline::Analysis& analysis)
{
    updateRows(analysis);
    // Part names need the network: the two-argument form fills these.
    for (int i = 0; i < topLevelItemCount(); ++i) {
        ConstantRow* row = constantRow(topLevelItem(i));
        row->hasExpressions = false;
        row->cells[ExpressionColumn].clear();
        row->cells[NullExpressionColumn].clear();
        row->expressionTip.clear();
    }
    viewport()->update();
    factoredText_.clear();
    if (factored_)
        factored_->clear();
}

void TimeConstantTable::updateRows(const tauline::Analysis& analysis)
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
            auto* row = new ConstantRow(this);
            const QString name = QString::fromStdString(tc.element);
            row->cells[PartColumn] = name;
            for (int c = TauColumn; c <= NullResistanceColumn; ++c)
                row->setTextAlignment(c, right);
            for (std::size_t k = 0; k < pairs[tc.element].size(); ++k) {
                auto* child = new PairRow(row);
                child->setTextAlignment(TauColumn, right);
                child->setTextAlignment(ResistanceColumn, right);
                child->setForeground(PartColumn, QColor(0x60, 0x66, 0x70));
            }
            row->setExpanded(expanded.contains(name));
        }
    }

    for (int i = 0; i < topLevelItemCount(); ++i) {
        ConstantRow* row = constantRow(topLevelItem(i));
        const auto& tc = analysis.timeConstants[i];
        row->cells[TauColumn] = secondsText(tc.tau);
        row->cells[ResistanceColumn] = ohmsText(tc.r);
        row->cells[NullTauColumn] = nullText(tc.tauNull, true);
        row->cells[NullResistanceColumn] = nullText(tc.rNull, false);
        const auto& children = pairs[tc.element];
        for (int k = 0; k < row->childCount(); ++k)
            static_cast<PairRow*>(row->child(k))->setPair(*children[k]);
    }
    // Only the number columns change with a value: the names and part-name
    // expressions beside them are not painted again.
    QRect numbers;
    for (int c = TauColumn; c <= NullResistanceColumn; ++c)
        if (!header()->isSectionHidden(c))
            numbers |= QRect(header()->sectionViewportPosition(c), 0, header()->sectionSize(c),
                             viewport()->height());
    viewport()->update(numbers);
}

void TimeConstantTable::clearConstants()
{
    clear();
    factoredText_.clear();
    if (factored_)
        factored_->clear();
}

}  // namespace tauline::ui
