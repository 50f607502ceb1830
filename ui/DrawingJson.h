// The drawing as saved in a network file, under "drawing" (the version-1
// fields stay the netlist; this object only says where things are drawn):
//
//   "drawing": {
//     "format": "tauline-drawing", "version": 1, "grid": 10,
//     "analysable": true,           // false: saved before it had a response
//     "parts": [{"name": "R1", "kind": "resistor", "value": 4700, "text": "4k7",
//                "at": [x, y], "turns": 0, "mirror": false}],
//     "grounds": [{"at": [x, y], "turns": 0, "mirror": false}],
//     "wires": [{"points": [[x, y], [x, y], ...], "label": "out"}],
//     "markers": [{"role": "port" | "input" | "output", "drive": "voltage" | "current",
//                  "at": [x, y], "turns": 0, "mirror": false}],
//     "view": {"centre": [x, y], "zoom": 1.0}
//   }
//
// Coordinates are scene units on a 10-unit grid, y downwards. "at" is the
// symbol's origin: the middle of a part or marker, the pin of a ground.
// "turns" counts clockwise quarter turns; "mirror" flips the symbol across its
// own vertical axis before it is turned. A part lies along x with terminal 1
// (the file's first node) at (−20, 0) and terminal 2 at (20, 0); a marker
// stands along y with + at (0, −20) and − at (0, 20); a marker's − terminal
// that touches nothing is ground. Wires join whatever lies on them; two wires
// that only cross are not joined; a wire "label" names its node, and wires with
// the same label are one node. Parts repeat their kind and value so that parts
// the netlist cannot hold (both ends on one node) survive a save; for parts in
// the netlist, the netlist's value wins. "label" and "drive" (input markers
// only) are left out when empty or irrelevant, "view" when no view exists.
#pragma once

#include "Network.h"

#include <QPointF>
#include <QString>

#include <nlohmann/json.hpp>

#include <optional>
#include <vector>

namespace tauline::ui {

inline constexpr const char* kDrawingFormat = "tauline-drawing";

struct DrawingView {
    QPointF centre;
    double zoom = 1.0;
};

// Item states (as SchematicItem::state() gives them, in id order) to the
// drawing object.
nlohmann::json drawingFromItems(const std::vector<nlohmann::json>& states, bool analysable,
                                const std::optional<DrawingView>& view);

// The drawing object back to item states (without ids). Parts named in
// `network` take kind, value and text from it. False (with a reason) when the
// object is not a drawing this build reads.
bool itemsFromDrawing(const nlohmann::json& drawing, const tauline::Network* network,
                      std::vector<nlohmann::json>* states, QString* error);

std::optional<DrawingView> viewFromDrawing(const nlohmann::json& drawing);
bool drawingIsAnalysable(const nlohmann::json& drawing);

}  // namespace tauline::ui
