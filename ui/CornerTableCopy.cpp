#include "CornerTableCopy.h"

#include "CornerTable.h"

#include <QAction>
#include <QApplication>
#include <QClipboard>
#include <QTableWidget>

namespace tauline::ui {

CornerTableCopy::CornerTableCopy(CornerTable* table) : QObject(table), table_(table)
{
    csv_ = new QAction(tr("Copy Corners as &CSV"), this);
    csv_->setStatusTip(tr("Copy the corner table for a spreadsheet (frequencies in Hz)"));
    csv_->setObjectName(QStringLiteral("copyCornersCsvAction"));
    markdown_ = new QAction(tr("Copy Corners as &Markdown"), this);
    markdown_->setObjectName(QStringLiteral("copyCornersMarkdownAction"));
    markdown_->setStatusTip(tr("Copy the corner table as a Markdown table"));
    connect(csv_, &QAction::triggered, this, &CornerTableCopy::copyCsv);
    connect(markdown_, &QAction::triggered, this, &CornerTableCopy::copyMarkdown);
    table->setContextMenuPolicy(Qt::ActionsContextMenu);
    table->addAction(csv_);
    table->addAction(markdown_);
    // Enabled while there are corners to copy.
    auto* model = table->model();
    connect(model, &QAbstractItemModel::rowsInserted, this, &CornerTableCopy::updateEnabled);
    connect(model, &QAbstractItemModel::rowsRemoved, this, &CornerTableCopy::updateEnabled);
    connect(model, &QAbstractItemModel::modelReset, this, &CornerTableCopy::updateEnabled);
    updateEnabled();
}

tauline::TableText CornerTableCopy::shownText(const QTableWidget& table, bool numbersInHz)
{
    tauline::TableText text;
    QList<int> columns;
    for (int c = 0; c < table.columnCount(); ++c)
        if (!table.isColumnHidden(c))
            columns << c;
    // A column is numeric when every filled cell carries a frequency.
    QList<bool> inHz;
    for (int c : columns) {
        bool all = numbersInHz && table.rowCount() > 0;
        for (int r = 0; all && r < table.rowCount(); ++r) {
            const QTableWidgetItem* item = table.item(r, c);
            all = item && item->data(CornerTable::HzRole).isValid();
        }
        inHz << all;
    }
    for (qsizetype i = 0; i < columns.size(); ++i) {
        const QTableWidgetItem* header = table.horizontalHeaderItem(columns[i]);
        QString name = header ? header->text() : QString::number(columns[i] + 1);
        if (inHz[i])
            name += QStringLiteral(" (Hz)");
        text.header.push_back(name.toStdString());
    }
    for (int r = 0; r < table.rowCount(); ++r) {
        std::vector<std::string> row;
        for (qsizetype i = 0; i < columns.size(); ++i) {
            const QTableWidgetItem* item = table.item(r, columns[i]);
            if (!item)
                row.emplace_back();
            else if (inHz[i])
                row.push_back(QString::number(item->data(CornerTable::HzRole).toDouble(), 'g', 10).toStdString());
            else
                row.push_back(item->text().toStdString());
        }
        text.rows.push_back(std::move(row));
    }
    return text;
}

void CornerTableCopy::copyCsv() const
{
    QApplication::clipboard()->setText(QString::fromStdString(tauline::csvText(shownText(*table_, true))));
}

void CornerTableCopy::copyMarkdown() const
{
    QApplication::clipboard()->setText(
        QString::fromStdString(tauline::markdownText(shownText(*table_, false))));
}

void CornerTableCopy::updateEnabled()
{
    const bool any = table_->rowCount() > 0;
    csv_->setEnabled(any);
    markdown_->setEnabled(any);
}

}  // namespace tauline::ui
