// Drawing items on the clipboard: their states as JSON
// ({"format": "tauline-items", "version": 1, "items": [state, ...]}), and
// where pasted items land: shifted two grid steps at a time until none sits on
// an item of its kind (so a cut and paste stays put), with new ids, and parts
// whose names are taken renamed to the next free automatic name.
#pragma once

#include "ItemStates.h"

#include <QByteArray>
#include <QSet>
#include <QString>

#include <functional>
#include <vector>

namespace tauline::ui {

QByteArray itemsToClipboard(const std::vector<nlohmann::json>& states);

// The item states on the clipboard, those this build can rebuild; empty when
// the text is not ours.
std::vector<nlohmann::json> itemsFromClipboard(const QByteArray& bytes);

struct PasteContext {
    std::vector<nlohmann::json> existing;  // states of the items already drawn
    QSet<QString> takenNames;
    std::function<ItemId()> newId;
    // The next free name for a part kind ("resistor") given the names taken.
    std::function<QString(const std::string& kind, const QSet<QString>& taken)> nextName;
};

ItemStates placePastedItems(const std::vector<nlohmann::json>& incoming, const PasteContext& context);

}  // namespace tauline::ui
