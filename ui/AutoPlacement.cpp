#include "AutoPlacement.h"

#include "DrawingJson.h"

#include <algorithm>
#include <deque>
#include <map>
#include <set>

namespace tauline::ui {

namespace {

using json = nlohmann::json;

constexpr int kRowPitch = 80;
constexpr int kColumnPitch = 100;

// A two-terminal thing to stand in a column: a part or a marker.
struct Element {
    json state;                    // item state without position
    std::string first, second;     // terminal 1 (+) and terminal 2 (−) nodes
    bool isMarker = false;
    int order = 0;
};

bool isTwoTerminal(tauline::PartKind kind)
{
    return kind == tauline::PartKind::Resistor || kind == tauline::PartKind::Capacitor
           || kind == tauline::PartKind::Inductor;
}

json markerState(const char* role, tauline::ResponseKind kind)
{
    json s;
    s["type"] = "marker";
    s["role"] = role;
    s["drive"] = kind == tauline::ResponseKind::Transimpedance ? "current" : "voltage";
    return s;
}

json wireState(std::vector<std::pair<int, int>> points, const std::string& label)
{
    json s;
    s["type"] = "wire";
    json pts = json::array();
    for (auto [x, y] : points)
        pts.push_back({x, y});
    s["points"] = pts;
    s["label"] = label;
    return s;
}

}  // namespace

AutoPlacementResult placeAutomatically(const tauline::Network& network)
{
    AutoPlacementResult result;
    const std::string gnd = tauline::kGroundNode;
    const auto& r = network.response;
    const bool hasResponse = !r.input[0].empty() && !r.input[1].empty();
    const bool isPort = r.kind == tauline::ResponseKind::Impedance;

    std::vector<Element> parts;
    for (const tauline::Part& p : network.parts) {
        if (!isTwoTerminal(p.kind)) {
            result.warnings.push_back(QStringLiteral("%1: a %2 cannot be drawn yet; it is left out of the drawing")
                                          .arg(QString::fromStdString(p.name), QLatin1String(tauline::kindName(p.kind))));
            continue;
        }
        Element e;
        e.state = {{"type", "part"}, {"name", p.name}, {"kind", tauline::kindName(p.kind)},
                   {"value", p.value}, {"text", p.valueText}};
        e.first = p.nodes[0];
        e.second = p.nodes[1];
        e.order = int(parts.size());
        parts.push_back(e);
    }
    std::vector<Element> before, after;
    if (hasResponse) {
        Element in;
        in.state = markerState(isPort ? "port" : "input", r.kind);
        in.first = r.input[0];
        in.second = r.input[1];
        in.isMarker = true;
        before.push_back(in);
        if (!isPort) {
            Element out;
            out.state = markerState("output", r.kind);
            out.first = r.output[0];
            out.second = r.output[1];
            out.isMarker = true;
            after.push_back(out);
        }
    }

    // Rows: breadth-first from the input over parts, ground last.
    std::vector<std::string> appearance;
    auto note = [&](const std::string& n) {
        if (n != gnd && std::find(appearance.begin(), appearance.end(), n) == appearance.end())
            appearance.push_back(n);
    };
    if (hasResponse)
        note(r.input[0]);
    for (const Element& e : parts) {
        note(e.first);
        note(e.second);
    }
    for (const auto* list : {&before, &after})
        for (const Element& e : *list) {
            note(e.first);
            note(e.second);
        }
    std::map<std::string, std::vector<std::string>> neighbours;
    for (const Element& e : parts) {
        if (e.first != gnd && e.second != gnd) {
            neighbours[e.first].push_back(e.second);
            neighbours[e.second].push_back(e.first);
        }
    }
    std::map<std::string, int> depth;
    int nextDepth = 0;
    for (const std::string& start : appearance) {
        if (depth.count(start))
            continue;
        std::deque<std::string> queue{start};
        depth[start] = nextDepth;
        int deepest = nextDepth;
        while (!queue.empty()) {
            const std::string n = queue.front();
            queue.pop_front();
            for (const std::string& m : neighbours[n]) {
                if (!depth.count(m)) {
                    depth[m] = depth[n] + 1;
                    deepest = std::max(deepest, depth[m]);
                    queue.push_back(m);
                }
            }
        }
        nextDepth = deepest + 1;
    }
    // Columns: the input (or port) marker, the parts in breadth-first order
    // of their nodes, the output marker.
    auto depthOf = [&](const std::string& n, const std::string& other) {
        return n == gnd ? depth[other] : depth[n];
    };
    std::vector<Element*> columns;
    for (Element& e : before)
        columns.push_back(&e);
    std::vector<Element*> sortedParts;
    for (Element& e : parts)
        sortedParts.push_back(&e);
    std::stable_sort(sortedParts.begin(), sortedParts.end(), [&](const Element* a, const Element* b) {
        const int a0 = depthOf(a->first, a->second), a1 = depthOf(a->second, a->first);
        const int b0 = depthOf(b->first, b->second), b1 = depthOf(b->second, b->first);
        if (std::min(a0, a1) != std::min(b0, b1))
            return std::min(a0, a1) < std::min(b0, b1);
        return std::max(a0, a1) < std::max(b0, b1);
    });
    columns.insert(columns.end(), sortedParts.begin(), sortedParts.end());
    for (Element& e : after)
        columns.push_back(&e);

    // Rows: each node's bus spans the columns that touch it. Nodes share a
    // row when their spans do not meet and no part joins them, so a ladder
    // takes two rows rather than one per node. Ground is the bottom row.
    std::map<std::string, std::pair<int, int>> span;
    std::map<std::string, std::set<std::string>> joinedTo;
    for (size_t c = 0; c < columns.size(); ++c) {
        const Element& e = *columns[c];
        for (const std::string* n : {&e.first, &e.second}) {
            auto [it, added] = span.emplace(*n, std::make_pair(int(c), int(c)));
            if (!added) {
                it->second.first = std::min(it->second.first, int(c));
                it->second.second = std::max(it->second.second, int(c));
            }
        }
        joinedTo[e.first].insert(e.second);
        joinedTo[e.second].insert(e.first);
    }
    std::vector<std::string> order = appearance;
    std::stable_sort(order.begin(), order.end(),
                     [&](const std::string& a, const std::string& b) { return depth[a] < depth[b]; });
    std::map<std::string, int> rowOf;
    std::vector<std::vector<std::pair<int, int>>> taken;
    for (const std::string& node : order) {
        const auto [lo, hi] = span[node];
        for (int r = 0;; ++r) {
            if (r == int(taken.size()))
                taken.emplace_back();
            bool free = true;
            for (const std::string& other : joinedTo[node])
                free = free && !(rowOf.count(other) && rowOf[other] == r);
            for (const auto& [a, b] : taken[size_t(r)])
                free = free && (hi < a || b < lo);
            if (free) {
                rowOf[node] = r;
                taken[size_t(r)].push_back({lo, hi});
                break;
            }
        }
    }
    const int groundRow = int(taken.size());
    rowOf[gnd] = groundRow;
    auto rowY = [&](const std::string& n) { return rowOf[n] * kRowPitch; };

    struct Attachment {
        int x;
        int terminalY;
    };
    std::map<std::string, std::vector<Attachment>> attachments;
    for (size_t c = 0; c < columns.size(); ++c) {
        Element& e = *columns[c];
        const int x = int(c) * kColumnPitch;
        const int y1 = rowY(e.first);
        const int y2 = rowY(e.second);
        const int top = std::min(y1, y2);
        const bool firstOnTop = y1 <= y2;
        e.state["x"] = x;
        e.state["y"] = top + 40;
        e.state["mirror"] = false;
        // Parts lie along x (terminal 1 at the left): a quarter turn puts it on
        // top, three put it at the bottom. Markers stand with + on top.
        e.state["turns"] = e.isMarker ? (firstOnTop ? 0 : 2) : (firstOnTop ? 1 : 3);
        attachments[e.first].push_back({x, firstOnTop ? top + 20 : top + 60});
        attachments[e.second].push_back({x, firstOnTop ? top + 60 : top + 20});
    }

    std::vector<json> states;
    for (const Element& e : parts)
        states.push_back(e.state);
    for (const Element* e : columns) {
        if (e->isMarker)
            states.push_back(e->state);
    }
    std::vector<std::string> nodes = order;
    if (attachments.count(gnd))
        nodes.push_back(gnd);
    for (const std::string& node : nodes) {
        const auto& list = attachments[node];
        if (list.empty())
            continue;
        const int y = rowY(node);
        int left = list.front().x, right = list.front().x;
        for (const Attachment& a : list) {
            left = std::min(left, a.x);
            right = std::max(right, a.x);
        }
        const bool bus = left != right;
        const std::string label = node == gnd ? std::string() : node;
        for (const Attachment& a : list)
            states.push_back(wireState({{a.x, a.terminalY}, {a.x, y}}, bus ? std::string() : label));
        if (bus)
            states.push_back(wireState({{left, y}, {right, y}}, label));
        if (node == gnd) {
            json ground = {{"type", "ground"}, {"x", left}, {"y", y}, {"turns", 0}, {"mirror", false}};
            states.push_back(ground);
        }
    }
    result.drawing = drawingFromItems(states, hasResponse, std::nullopt);
    return result;
}

}  // namespace tauline::ui
