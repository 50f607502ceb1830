#include "ItemStates.h"

namespace tauline::ui {

QPoint GridMotion::map(QPoint p) const
{
    QPoint q = p - centre;
    if (mirror)
        q.setX(-q.x());
    for (int k = 0; k < ((quarterTurns % 4) + 4) % 4; ++k)
        q = QPoint(-q.y(), q.x());  // clockwise on a y-down screen
    return centre + q + delta;
}

QVector<QPoint> wirePoints(const nlohmann::json& s)
{
    QVector<QPoint> pts;
    if (s.contains("points") && s["points"].is_array()) {
        for (const auto& pt : s["points"]) {
            if (pt.is_array() && pt.size() == 2 && pt[0].is_number() && pt[1].is_number())
                pts.push_back(QPoint(pt[0].get<int>(), pt[1].get<int>()));
        }
    }
    return pts;
}

void setWirePoints(nlohmann::json& s, const QVector<QPoint>& points)
{
    nlohmann::json pts = nlohmann::json::array();
    for (const QPoint& p : points)
        pts.push_back({p.x(), p.y()});
    s["points"] = pts;
}

nlohmann::json movedState(const nlohmann::json& state, const GridMotion& m)
{
    nlohmann::json s = state;
    if (s.value("type", std::string()) == "wire") {
        QVector<QPoint> pts = wirePoints(s);
        for (QPoint& p : pts)
            p = m.map(p);
        setWirePoints(s, pts);
        return s;
    }
    const QPoint at = m.map(QPoint(s.value("x", 0), s.value("y", 0)));
    s["x"] = at.x();
    s["y"] = at.y();
    int turns = s.value("turns", 0);
    bool mirrored = s.value("mirror", false);
    if (m.mirror) {
        // A mirror after a turn is the opposite turn after the mirror.
        turns = -turns;
        mirrored = !mirrored;
    }
    turns += m.quarterTurns;
    s["turns"] = ((turns % 4) + 4) % 4;
    s["mirror"] = mirrored;
    return s;
}

}  // namespace tauline::ui
