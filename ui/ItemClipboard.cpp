#include "ItemClipboard.h"

#include "CanvasStyle.h"
#include "SchematicItem.h"
#include "SchematicScene.h"

#include <memory>

namespace tauline::ui {

namespace {

constexpr const char* kFormat = "tauline-items";

QString typeOf(const nlohmann::json& s)
{
    return QString::fromStdString(s.value("type", std::string()));
}

QPoint anchorOf(const nlohmann::json& s)
{
    return typeOf(s) == QLatin1String("wire") ? wirePoints(s).value(0) : QPoint(s.value("x", 0), s.value("y", 0));
}

}  // namespace

QByteArray itemsToClipboard(const std::vector<nlohmann::json>& states)
{
    if (states.empty())
        return {};
    nlohmann::json clip;
    clip["format"] = kFormat;
    clip["version"] = 1;
    clip["items"] = states;
    return QByteArray::fromStdString(clip.dump());
}

std::vector<nlohmann::json> itemsFromClipboard(const QByteArray& bytes)
{
    const nlohmann::json clip = nlohmann::json::parse(bytes.toStdString(), nullptr, false);
    std::vector<nlohmann::json> out;
    if (!clip.is_object() || clip.value("format", std::string()) != kFormat || !clip.contains("items")
        || !clip["items"].is_array())
        return out;
    for (const auto& s : clip["items"]) {
        std::unique_ptr<SchematicItem> probe(s.is_object() ? SchematicScene::createItem(s) : nullptr);
        if (probe)
            out.push_back(s);
    }
    return out;
}

ItemStates placePastedItems(const std::vector<nlohmann::json>& incoming, const PasteContext& context)
{
    QSet<QPair<QString, QPoint>> occupied;
    for (const nlohmann::json& s : context.existing)
        occupied.insert({typeOf(s), anchorOf(s)});
    QPoint offset;
    for (int attempt = 0; attempt < 50; ++attempt) {
        bool clash = false;
        for (const nlohmann::json& s : incoming)
            clash = clash || occupied.contains({typeOf(s), anchorOf(s) + offset});
        if (!clash)
            break;
        offset += QPoint(2 * style::kGrid, 2 * style::kGrid);
    }
    GridMotion motion;
    motion.delta = offset;
    QSet<QString> taken = context.takenNames;
    ItemStates pasted;
    for (nlohmann::json s : incoming) {
        s = movedState(s, motion);
        const ItemId id = context.newId();
        s["id"] = id;
        if (typeOf(s) == QLatin1String("part")) {
            const QString name = QString::fromStdString(s.value("name", std::string()));
            if (name.isEmpty() || taken.contains(name))
                s["name"] = context.nextName(s.value("kind", std::string()), taken).toStdString();
            taken.insert(QString::fromStdString(s["name"].get<std::string>()));
        }
        pasted[id] = s;
    }
    return pasted;
}

}  // namespace tauline::ui
