// The tauline::Network a drawing describes, and what keeps it from having a
// response: turns nodes and markers into parts and a ResponseSpec.
#pragma once

#include "Connectivity.h"
#include "DrawingProblem.h"

#include <QList>

namespace tauline::ui {

struct DerivedNetwork {
    tauline::Network network;
    bool hasResponse = false;
    // Why there is no response, or what is wrong with the markers.
    QList<DrawingProblem> responseProblems;
    // Parts left out because both ends are on one node.
    QStringList shortedParts;
};

// Parts in creation order; a part with both ends on one node is left out
// (the file format forbids it); parts with open ends stay in (they carry no
// signal, and the engine says so). A marker's − terminal that touches nothing
// stands for ground.
DerivedNetwork deriveNetwork(const DrawingSnapshot& drawing, const Connectivity& connectivity);

}  // namespace tauline::ui
