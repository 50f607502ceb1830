#include "DrawingJson.h"

#include "CanvasStyle.h"

#include <map>

namespace tauline::ui {

namespace {

using json = nlohmann::json;

json pointArray(const json& state)
{
    return json::array({state.value("x", 0), state.value("y", 0)});
}

bool readPoint(const json& value, int* x, int* y)
{
    if (!value.is_array() || value.size() != 2 || !value[0].is_number() || !value[1].is_number())
        return false;
    *x = int(std::lround(value[0].get<double>()));
    *y = int(std::lround(value[1].get<double>()));
    return true;
}

void writeOrientation(json& out, const json& state)
{
    out["at"] = pointArray(state);
    out["turns"] = state.value("turns", 0);
    out["mirror"] = state.value("mirror", false);
}

bool readOrientation(const json& in, json& state)
{
    int x = 0, y = 0;
    if (!in.contains("at") || !readPoint(in["at"], &x, &y))
        return false;
    state["x"] = x;
    state["y"] = y;
    const json turns = in.value("turns", json(0));
    state["turns"] = turns.is_number_integer() ? ((turns.get<int>() % 4) + 4) % 4 : 0;
    const json mirror = in.value("mirror", json(false));
    state["mirror"] = mirror.is_boolean() && mirror.get<bool>();
    return true;
}

const json& listOf(const json& drawing, const char* key)
{
    static const json empty = json::array();
    auto it = drawing.find(key);
    return it != drawing.end() && it->is_array() ? *it : empty;
}

}  // namespace

json drawingFromItems(const std::vector<json>& states, bool analysable, const std::optional<DrawingView>& view)
{
    json d;
    d["format"] = kDrawingFormat;
    d["version"] = 1;
    d["grid"] = style::kGrid;
    d["analysable"] = analysable;
    json parts = json::array(), grounds = json::array(), wires = json::array(), markers = json::array();
    for (const json& s : states) {
        const std::string type = s.value("type", std::string());
        if (type == "part") {
            json p;
            p["name"] = s.value("name", std::string());
            p["kind"] = s.value("kind", std::string());
            p["value"] = s.value("value", 0.0);
            if (!s.value("text", std::string()).empty())
                p["text"] = s["text"];
            writeOrientation(p, s);
            parts.push_back(p);
        } else if (type == "ground") {
            json g;
            writeOrientation(g, s);
            grounds.push_back(g);
        } else if (type == "wire") {
            json w;
            w["points"] = s.value("points", json::array());
            if (!s.value("label", std::string()).empty())
                w["label"] = s["label"];
            wires.push_back(w);
        } else if (type == "marker") {
            json m;
            m["role"] = s.value("role", std::string());
            if (m["role"] == "input")
                m["drive"] = s.value("drive", std::string("voltage"));
            writeOrientation(m, s);
            markers.push_back(m);
        }
    }
    d["parts"] = parts;
    d["grounds"] = grounds;
    d["wires"] = wires;
    d["markers"] = markers;
    if (view) {
        d["view"] = {{"centre", {view->centre.x(), view->centre.y()}}, {"zoom", view->zoom}};
    }
    return d;
}

bool itemsFromDrawing(const json& drawing, const tauline::Network* network, std::vector<json>* states,
                      QString* error)
{
    if (!drawing.is_object() || drawing.value("format", std::string()) != kDrawingFormat) {
        *error = QStringLiteral("the \"drawing\" object is not a %1 object").arg(QLatin1String(kDrawingFormat));
        return false;
    }
    if (drawing.value("version", 0) != 1) {
        *error = QStringLiteral("drawing version %1 is not supported")
                     .arg(QString::fromStdString(drawing.value("version", json(0)).dump()));
        return false;
    }
    std::map<std::string, const tauline::Part*> netlist;
    if (network) {
        for (const tauline::Part& p : network->parts)
            netlist[p.name] = &p;
    }
    for (const json& p : listOf(drawing, "parts")) {
        if (!p.is_object() || !p.contains("name") || !p["name"].is_string())
            continue;
        json s;
        s["type"] = "part";
        s["id"] = 0;
        s["name"] = p["name"];
        auto it = netlist.find(p["name"].get<std::string>());
        if (it != netlist.end()) {
            s["kind"] = tauline::kindName(it->second->kind);
            s["value"] = it->second->value;
            s["text"] = it->second->valueText;
        } else {
            if (!p.contains("kind") || !p["kind"].is_string() || !p.contains("value") || !p["value"].is_number()
                || !(p["value"].get<double>() > 0.0))
                continue;
            s["kind"] = p["kind"];
            s["value"] = p["value"];
            s["text"] = p.value("text", json("")).is_string() ? p.value("text", std::string()) : std::string();
        }
        if (!readOrientation(p, s))
            continue;
        states->push_back(s);
    }
    for (const json& g : listOf(drawing, "grounds")) {
        json s;
        s["type"] = "ground";
        s["id"] = 0;
        if (g.is_object() && readOrientation(g, s))
            states->push_back(s);
    }
    for (const json& w : listOf(drawing, "wires")) {
        if (!w.is_object() || !w.contains("points") || !w["points"].is_array())
            continue;
        json s;
        s["type"] = "wire";
        s["id"] = 0;
        json points = json::array();
        for (const json& pt : w["points"]) {
            int x = 0, y = 0;
            if (readPoint(pt, &x, &y))
                points.push_back({x, y});
        }
        if (points.size() < 2)
            continue;
        s["points"] = points;
        s["label"] = w.value("label", json("")).is_string() ? w.value("label", std::string()) : std::string();
        states->push_back(s);
    }
    for (const json& m : listOf(drawing, "markers")) {
        if (!m.is_object())
            continue;
        const std::string role = m.value("role", json("")).is_string() ? m.value("role", std::string()) : "";
        if (role != "port" && role != "input" && role != "output")
            continue;
        json s;
        s["type"] = "marker";
        s["id"] = 0;
        s["role"] = role;
        const std::string drive = m.value("drive", json("voltage")).is_string() ? m.value("drive", std::string("voltage")) : "voltage";
        s["drive"] = drive == "current" ? "current" : "voltage";
        if (readOrientation(m, s))
            states->push_back(s);
    }
    return true;
}

std::optional<DrawingView> viewFromDrawing(const json& drawing)
{
    if (!drawing.is_object() || !drawing.contains("view") || !drawing["view"].is_object())
        return std::nullopt;
    const json& v = drawing["view"];
    if (!v.contains("centre") || !v["centre"].is_array() || v["centre"].size() != 2 || !v["centre"][0].is_number()
        || !v["centre"][1].is_number())
        return std::nullopt;
    DrawingView view;
    view.centre = QPointF(v["centre"][0].get<double>(), v["centre"][1].get<double>());
    const json zoom = v.value("zoom", json(1.0));
    view.zoom = zoom.is_number() && zoom.get<double>() > 0.01 && zoom.get<double>() < 100 ? zoom.get<double>() : 1.0;
    return view;
}

bool drawingIsAnalysable(const json& drawing)
{
    return !drawing.is_object() || drawing.value("analysable", json(true)) != json(false);
}

}  // namespace tauline::ui
