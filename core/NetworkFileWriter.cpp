// Writing version-1 network files: one part per line so that a diff of two
// saved files shows which part changed.
#include "NetworkFile.h"

#include "Errors.h"
#include "ValueParser.h"

namespace tauline {

namespace {

using nlohmann::ordered_json;

std::string dumped(const ordered_json& value, int indent = -1)
{
    // Replacing invalid UTF-8 instead of throwing: a save must not fail on a
    // stray byte in a title.
    return value.dump(indent, ' ', false, ordered_json::error_handler_t::replace);
}

// {"name": "R1", "kind": "resistor"} rather than the compact form without
// spaces, to match how people write these files by hand.
std::string oneLine(const ordered_json& value)
{
    if (value.is_object()) {
        std::string out = "{";
        bool first = true;
        for (const auto& [key, item] : value.items()) {
            out += (first ? "" : ", ") + dumped(ordered_json(key)) + ": " + oneLine(item);
            first = false;
        }
        return out + "}";
    }
    if (value.is_array()) {
        std::string out = "[";
        for (size_t i = 0; i < value.size(); ++i)
            out += (i == 0 ? "" : ", ") + oneLine(value[i]);
        return out + "]";
    }
    return dumped(value);
}

bool readsBackAs(const std::string& text, PartKind kind, double value)
{
    try {
        return parseValue(text, kind) == value;
    } catch (const InputError&) {
        return false;
    }
}

// The text the user typed when it still means the stored value; otherwise
// the formatted value, or the plain number when no text reads back exactly.
ordered_json valueField(const Part& part)
{
    if (!part.valueText.empty() && readsBackAs(part.valueText, part.kind, part.value))
        return part.valueText;
    std::string formatted = formatValue(part.value, part.kind);
    if (readsBackAs(formatted, part.kind, part.value))
        return formatted;
    return part.value;
}

ordered_json partObject(const Part& part)
{
    ordered_json object;
    object["name"] = part.name;
    object["kind"] = kindName(part.kind);
    object["value"] = valueField(part);
    object["nodes"] = {part.nodes[0], part.nodes[1]};
    if (part.kind == PartKind::Transconductance || part.kind == PartKind::VoltageAmplifier)
        object["control"] = {part.control[0], part.control[1]};
    return object;
}

ordered_json responseObject(const ResponseSpec& response)
{
    ordered_json object;
    object["kind"] = responseKindName(response.kind);
    if (response.kind == ResponseKind::Impedance) {
        object["port"] = {response.input[0], response.input[1]};
    } else {
        object["input"] = {response.input[0], response.input[1]};
        object["output"] = {response.output[0], response.output[1]};
    }
    return object;
}

// Nested objects and lists open up one level per line, but anything that
// fits on a line (a point, a wire, a part's position) stays on one line.
std::string pretty(const ordered_json& value, const std::string& indent)
{
    constexpr size_t kLineWidth = 100;
    std::string flat = oneLine(value);
    if (indent.size() + flat.size() <= kLineWidth || !(value.is_structured() && !value.empty()))
        return flat;
    const std::string inner = indent + "  ";
    std::string out = value.is_object() ? "{" : "[";
    bool first = true;
    if (value.is_object()) {
        for (const auto& [key, item] : value.items()) {
            out += (first ? "\n" : ",\n") + inner + dumped(ordered_json(key)) + ": " + pretty(item, inner);
            first = false;
        }
    } else {
        for (const auto& item : value) {
            out += (first ? "\n" : ",\n") + inner + pretty(item, inner);
            first = false;
        }
    }
    return out + "\n" + indent + (value.is_object() ? "}" : "]");
}

}  // namespace

std::string writeNetworkText(const Network& network, const nlohmann::json& drawing)
{
    std::string out = "{\n";
    out += "  \"format\": \"tauline-network\",\n";
    out += "  \"version\": 1,\n";
    out += "  \"title\": " + dumped(network.title) + ",\n";
    out += "  \"parts\": [";
    for (size_t i = 0; i < network.parts.size(); ++i)
        out += std::string(i == 0 ? "\n" : ",\n") + "    " + oneLine(partObject(network.parts[i]));
    out += network.parts.empty() ? "],\n" : "\n  ],\n";
    out += "  \"response\": " + oneLine(responseObject(network.response));
    if (!drawing.is_null())
        out += ",\n  \"drawing\": " + pretty(ordered_json(drawing), "  ");
    out += "\n}\n";
    return out;
}

}  // namespace tauline
