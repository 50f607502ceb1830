// Reading a version-1 network file: every problem is collected (one message
// each, naming the file and the part or field) before anything is returned,
// so a caller never sees half a network.
#include "NetworkFile.h"

#include "Errors.h"
#include "ValueParser.h"

#include <cerrno>
#include <cstring>
#include <filesystem>
#include <fstream>
#include <map>
#include <optional>
#include <set>
#include <sstream>

namespace tauline {

namespace {

using nlohmann::json;

constexpr const char* kFormatName = "tauline-network";
constexpr int kFormatVersion = 1;
// Far beyond any drawing a person makes; stops a stray multi-gigabyte file
// from being read into memory.
constexpr std::uintmax_t kMaxFileBytes = 64u * 1024u * 1024u;

class Problems {
public:
    explicit Problems(std::string file) : file_(std::move(file)) {}
    void add(const std::string& where, const std::string& what) { list_.push_back(file_ + ": " + where + ": " + what); }
    bool empty() const { return list_.empty(); }
    [[noreturn]] void raise() { throw InputError(std::move(list_)); }

private:
    std::string file_;
    std::vector<std::string> list_;
};

std::string inQuotes(const std::string& text)
{
    return "\"" + text + "\"";
}

// A JSON value as the user wrote it, for messages: strings quoted, others dumped.
std::string shown(const json& value)
{
    return value.dump(-1, ' ', false, json::error_handler_t::replace);
}

std::string trimmed(const std::string& s)
{
    size_t begin = s.find_first_not_of(" \t\r\n");
    if (begin == std::string::npos)
        return "";
    size_t end = s.find_last_not_of(" \t\r\n");
    return s.substr(begin, end - begin + 1);
}

std::optional<PartKind> kindFromName(const std::string& name)
{
    for (PartKind kind : {PartKind::Resistor, PartKind::Capacitor, PartKind::Inductor, PartKind::Transconductance,
                          PartKind::VoltageAmplifier})
        if (name == kindName(kind))
            return kind;
    return std::nullopt;
}

bool supportedByThisBuild(PartKind kind)
{
    return kind == PartKind::Resistor || kind == PartKind::Capacitor;
}

// Two different, non-empty node names, e.g. a part's "nodes" or a response's
// "port". Reports under `where` and returns nothing on any problem.
std::optional<std::array<std::string, 2>> readNodePair(const json& object, const char* field, const std::string& where,
                                                      const char* meaning, Problems& problems)
{
    auto it = object.find(field);
    if (it == object.end()) {
        problems.add(where, std::string("missing ") + inQuotes(field) + " (" + meaning + ")");
        return std::nullopt;
    }
    if (!it->is_array() || it->size() != 2) {
        std::string found = it->is_array() ? std::to_string(it->size()) + " entries" : shown(*it);
        problems.add(where, inQuotes(field) + " must list exactly two node names (" + meaning + "), found " + found);
        return std::nullopt;
    }
    std::array<std::string, 2> pair;
    bool ok = true;
    for (size_t i = 0; i < 2; ++i) {
        const json& node = (*it)[i];
        if (!node.is_string() || trimmed(node.get<std::string>()).empty()) {
            problems.add(where, std::string(field) + "[" + std::to_string(i) + "] must be a non-empty node name, found " +
                                    shown(node));
            ok = false;
        } else {
            pair[i] = node.get<std::string>();
        }
    }
    if (!ok)
        return std::nullopt;
    if (pair[0] == pair[1]) {
        problems.add(where, inQuotes(field) + " has both ends on node " + inQuotes(pair[0]) + "; name two different nodes");
        return std::nullopt;
    }
    return pair;
}

struct PartsResult {
    std::vector<Part> parts;
    std::set<std::string> touchedNodes;
};

void readPart(const json& entry, size_t index, PartsResult& result, Problems& problems)
{
    std::string label = "part #" + std::to_string(index + 1);
    if (!entry.is_object()) {
        problems.add(label, "must be an object with name, kind, value and nodes, found " + shown(entry));
        return;
    }

    Part part;
    bool ok = true;
    auto name = entry.find("name");
    if (name == entry.end()) {
        problems.add(label, "missing \"name\"");
        ok = false;
    } else if (!name->is_string() || trimmed(name->get<std::string>()).empty()) {
        problems.add(label, "\"name\" must be non-empty text, found " + shown(*name));
        ok = false;
    } else {
        part.name = name->get<std::string>();
        label = "part " + part.name;
    }

    // Nodes are read whatever else is wrong, so the response check below does
    // not pile extra messages onto a part that only has a bad value.
    if (auto nodes = readNodePair(entry, "nodes", label, "the two nodes it connects", problems))
        part.nodes = *nodes;
    else
        ok = false;
    auto nodesField = entry.find("nodes");
    if (nodesField != entry.end() && nodesField->is_array())
        for (const auto& node : *nodesField)
            if (node.is_string())
                result.touchedNodes.insert(node.get<std::string>());

    std::optional<PartKind> kind;
    auto kindField = entry.find("kind");
    if (kindField == entry.end()) {
        problems.add(label, "missing \"kind\" (resistor or capacitor)");
    } else if (!kindField->is_string()) {
        problems.add(label, "\"kind\" must be text (resistor or capacitor), found " + shown(*kindField));
    } else if (!(kind = kindFromName(kindField->get<std::string>()))) {
        problems.add(label, "unknown kind " + inQuotes(kindField->get<std::string>()) + " (expected resistor or capacitor)");
    } else if (!supportedByThisBuild(*kind)) {
        problems.add(label, "kind " + inQuotes(kindName(*kind)) +
                                " is not supported by this build yet (it reads resistor and capacitor)");
        kind.reset();
    }
    if (!kind) {
        ok = false;
    } else {
        part.kind = *kind;
        auto value = entry.find("value");
        try {
            if (value == entry.end()) {
                problems.add(label, std::string("missing \"value\" (in ") + valueUnit(*kind) + ", e.g. " +
                                        (*kind == PartKind::Capacitor ? "\"10n\")" : "\"4k7\")"));
                ok = false;
            } else if (value->is_string()) {
                part.valueText = value->get<std::string>();
                part.value = parseValue(part.valueText, *kind);
            } else if (value->is_number()) {
                part.value = checkValue(value->get<double>(), *kind);
            } else {
                problems.add(label, "\"value\" must be a number or text such as \"4k7\", found " + shown(*value));
                ok = false;
            }
        } catch (const InputError& e) {
            for (const auto& problem : e.problems())
                problems.add(label, problem);
            ok = false;
        }
    }

    if (ok)
        result.parts.push_back(std::move(part));
}

PartsResult readParts(const json& root, Problems& problems)
{
    PartsResult result;
    auto parts = root.find("parts");
    if (parts == root.end()) {
        problems.add("parts", "missing \"parts\" (the list of resistors and capacitors)");
        return result;
    }
    if (!parts->is_array()) {
        problems.add("parts", "must be a list of parts, found " + shown(*parts));
        return result;
    }
    if (parts->empty()) {
        problems.add("parts", "the network has no parts");
        return result;
    }

    std::map<std::string, std::vector<size_t>> positionsByName;
    for (size_t i = 0; i < parts->size(); ++i) {
        const json& entry = (*parts)[i];
        readPart(entry, i, result, problems);
        if (entry.is_object()) {
            auto name = entry.find("name");
            if (name != entry.end() && name->is_string() && !trimmed(name->get<std::string>()).empty())
                positionsByName[name->get<std::string>()].push_back(i + 1);
        }
    }
    for (const auto& [name, positions] : positionsByName) {
        if (positions.size() < 2)
            continue;
        std::string list;
        for (size_t k = 0; k < positions.size(); ++k)
            list += (k == 0 ? "#" : (k + 1 == positions.size() ? " and #" : ", #")) + std::to_string(positions[k]);
        problems.add("part " + name, "the name is used by parts " + list + "; each part needs its own name");
    }
    return result;
}

std::optional<ResponseSpec> readResponse(const json& root, const std::set<std::string>& touched, bool checkNodes,
                                         Problems& problems)
{
    auto response = root.find("response");
    if (response == root.end()) {
        problems.add("response", "missing \"response\" (impedance, voltage-gain or transimpedance, with its nodes)");
        return std::nullopt;
    }
    if (!response->is_object()) {
        problems.add("response", "must be an object such as {\"kind\": \"impedance\", \"port\": [\"in\", \"gnd\"]}, found " +
                                     shown(*response));
        return std::nullopt;
    }
    auto kindField = response->find("kind");
    if (kindField == response->end()) {
        problems.add("response", "missing \"kind\" (impedance, voltage-gain or transimpedance)");
        return std::nullopt;
    }
    std::string kind = kindField->is_string() ? kindField->get<std::string>() : shown(*kindField);

    ResponseSpec spec;
    std::vector<std::pair<std::string, std::array<std::string, 2>>> named;
    if (kind == "impedance") {
        spec.kind = ResponseKind::Impedance;
        auto port = readNodePair(*response, "port", "response", "where the test current enters and leaves", problems);
        if (!port)
            return std::nullopt;
        spec.input = spec.output = *port;
        named.emplace_back("response.port", *port);
    } else if (kind == "voltage-gain" || kind == "transimpedance") {
        spec.kind = kind == "voltage-gain" ? ResponseKind::VoltageGain : ResponseKind::Transimpedance;
        auto input = readNodePair(*response, "input", "response", "the driven node pair", problems);
        auto output = readNodePair(*response, "output", "response", "the node pair whose voltage is the response",
                                   problems);
        if (!input || !output)
            return std::nullopt;
        spec.input = *input;
        spec.output = *output;
        named.emplace_back("response.input", *input);
        named.emplace_back("response.output", *output);
    } else {
        problems.add("response", "unknown kind " + (kindField->is_string() ? inQuotes(kind) : kind) +
                                     " (expected impedance, voltage-gain or transimpedance)");
        return std::nullopt;
    }

    bool ok = true;
    if (checkNodes) {
        for (const auto& [field, pair] : named) {
            for (const auto& node : pair) {
                if (!touched.count(node)) {
                    problems.add(field, "node " + inQuotes(node) + " is not connected to any part");
                    ok = false;
                }
            }
        }
    }
    return ok ? std::optional<ResponseSpec>(spec) : std::nullopt;
}

// format and version decide what every other field means, so when they are
// wrong the rest is not read (its messages would only mislead).
bool readHeader(const json& root, Problems& problems)
{
    bool ok = true;
    auto format = root.find("format");
    if (format == root.end()) {
        problems.add("format", std::string("missing \"format\": \"") + kFormatName + "\"; this is not a network file");
        ok = false;
    } else if (!format->is_string() || format->get<std::string>() != kFormatName) {
        problems.add("format", std::string("expected \"") + kFormatName + "\", found " + shown(*format));
        ok = false;
    }
    auto version = root.find("version");
    if (version == root.end()) {
        problems.add("version", "missing \"version\" (this build reads version 1)");
        ok = false;
    } else if (!version->is_number_integer()) {
        problems.add("version", "must be a whole number, found " + shown(*version));
        ok = false;
    } else if (version->get<long long>() != kFormatVersion) {
        long long v = version->get<long long>();
        problems.add("version", "version " + std::to_string(v) + " is not supported; this build reads version 1" +
                                    (v > kFormatVersion ? " (the file comes from a newer Tauline)" : ""));
        ok = false;
    }
    return ok;
}

}  // namespace

LoadedNetwork parseNetworkText(const std::string& rawText, const std::string& fileLabel)
{
    Problems problems(fileLabel);
    std::string_view text = rawText;
    if (text.substr(0, 3) == "\xEF\xBB\xBF")  // a byte-order mark some editors add
        text.remove_prefix(3);

    json root;
    try {
        root = json::parse(text);
    } catch (const json::exception& e) {
        std::string detail = e.what();
        if (detail.rfind("[json.exception.", 0) == 0 && detail.find("] ") != std::string::npos)
            detail = detail.substr(detail.find("] ") + 2);
        problems.add("JSON", "malformed: " + detail);
        problems.raise();
    }
    if (!root.is_object()) {
        problems.add("JSON", std::string("expected an object with \"format\": \"") + kFormatName + "\", found " +
                                 std::string(root.type_name()));
        problems.raise();
    }
    if (!readHeader(root, problems))
        problems.raise();

    LoadedNetwork loaded;
    auto title = root.find("title");
    if (title != root.end()) {
        if (title->is_string())
            loaded.network.title = title->get<std::string>();
        else if (!title->is_null())
            problems.add("title", "must be text, found " + shown(*title));
    }

    PartsResult parts = readParts(root, problems);
    // Without a single part every response node would be reported as
    // unconnected; the missing parts are the one real problem.
    bool partsListed = !parts.touchedNodes.empty();
    auto response = readResponse(root, parts.touchedNodes, partsListed, problems);

    if (!problems.empty())
        problems.raise();

    loaded.network.parts = std::move(parts.parts);
    loaded.network.response = *response;
    auto drawing = root.find("drawing");
    if (drawing != root.end())
        loaded.drawing = *drawing;
    return loaded;
}

LoadedNetwork readNetworkFile(const std::string& path)
{
    std::error_code ec;
    if (std::filesystem::is_directory(path, ec))
        throw InputError(path + ": is a folder, not a network file");
    std::ifstream in(path, std::ios::binary);
    if (!in)
        throw InputError(path + ": cannot open: " + std::strerror(errno));
    auto size = std::filesystem::file_size(path, ec);
    if (!ec && size > kMaxFileBytes)
        throw InputError(path + ": is " + std::to_string(size / (1024 * 1024)) +
                         " MiB, far too large for a network file");
    std::ostringstream buffer;
    buffer << in.rdbuf();
    if (in.bad())
        throw InputError(path + ": cannot read: " + std::strerror(errno));
    return parseNetworkText(buffer.str(), path);
}

}  // namespace tauline
