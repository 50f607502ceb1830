#pragma once

#include "CornerTableText.h"

#include <QObject>

class QAction;
class QTableWidget;

namespace tauline::ui {

class CornerTable;

// "Copy as CSV" and "Copy as Markdown" for the corner table: the table as
// it is shown (its visible columns, header and text) onto the clipboard.
// The CSV gives frequencies as plain numbers in Hz for a spreadsheet; the
// Markdown keeps the text as shown, for a note or a review. The actions
// sit in the table's context menu; the window puts them in its Edit menu.
class CornerTableCopy : public QObject {
    Q_OBJECT
public:
    explicit CornerTableCopy(CornerTable* table);

    QAction* csvAction() const { return csv_; }
    QAction* markdownAction() const { return markdown_; }

    // The table's visible columns; with numbersInHz a cell carrying a
    // frequency (CornerTable::HzRole) gives the number and its header says
    // "(Hz)".
    static tauline::TableText shownText(const QTableWidget& table, bool numbersInHz);

    void copyCsv() const;
    void copyMarkdown() const;

private:
    void updateEnabled();

    CornerTable* table_;
    QAction* csv_;
    QAction* markdown_;
};

}  // namespace tauline::ui
