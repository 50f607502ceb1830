// What the scene's files share about item states and tools.
#pragma once

#include "SchematicScene.h"

#include "Network.h"

#include <nlohmann/json.hpp>

#include <optional>
#include <string>

namespace tauline::ui {

inline std::optional<tauline::PartKind> partKindFromName(const std::string& name)
{
    for (auto kind : {tauline::PartKind::Resistor, tauline::PartKind::Capacitor, tauline::PartKind::Inductor,
                      tauline::PartKind::Transconductance, tauline::PartKind::VoltageAmplifier}) {
        if (name == tauline::kindName(kind))
            return kind;
    }
    return std::nullopt;
}

inline bool isPlacementTool(SchematicScene::Tool tool)
{
    return tool != SchematicScene::Tool::Select && tool != SchematicScene::Tool::Wire;
}

// The "type" of an item state: part, ground, marker or wire.
inline QString stateType(const nlohmann::json& s)
{
    return QString::fromStdString(s.value("type", std::string()));
}

}  // namespace tauline::ui
