#pragma once

#include "Network.h"

#include <nlohmann/json.hpp>
#include <string>
#include <vector>

namespace tauline {

struct LoadedNetwork {
    Network network;
    std::vector<std::string> warnings;  // e.g. parts in a separate piece
    // Everything in the file beyond the version-1 minimum (the drawing: part
    // positions, wires, view), handed back untouched for the editor.
    nlohmann::json drawing;
};

// Reads a .tauline file. Throws InputError with one message per problem, each
// naming the file and the part or field; never returns a half-loaded network.
LoadedNetwork readNetworkFile(const std::string& path);

// The same from text already in memory; fileLabel names it in messages.
LoadedNetwork parseNetworkText(const std::string& text, const std::string& fileLabel);

// The version-1 JSON for a network, with the drawing object stored under
// "drawing" when it is not null.
std::string writeNetworkText(const Network& network, const nlohmann::json& drawing = nullptr);

}  // namespace tauline
