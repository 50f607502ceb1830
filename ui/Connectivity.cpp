#include "Connectivity.h"

#include "WireGeometry.h"

#include <QMap>
#include <QSet>

#include <algorithm>
#include <climits>
#include <numeric>

namespace tauline::ui {

namespace {

class DisjointSets {
public:
    explicit DisjointSets(int size) : parent_(size) { std::iota(parent_.begin(), parent_.end(), 0); }
    int find(int x)
    {
        while (parent_[x] != x) {
            parent_[x] = parent_[parent_[x]];
            x = parent_[x];
        }
        return x;
    }
    void join(int a, int b)
    {
        a = find(a);
        b = find(b);
        if (a != b)
            parent_[std::max(a, b)] = std::min(a, b);
    }

private:
    std::vector<int> parent_;
};

struct Endpoint {
    QPoint at;
    int element;
};

// Wires by the coarse cells their segments pass through: a point is tested
// only against the few wires near it.
class WireCells {
public:
    explicit WireCells(const QVector<DrawnWire>& wires)
    {
        for (int w = 0; w < wires.size(); ++w) {
            const QVector<QPoint>& pts = wires[w].points;
            for (qsizetype i = 0; i < pts.size(); ++i) {
                const QPoint a = pts[i];
                const QPoint b = pts[i + 1 < pts.size() ? i + 1 : i];
                for (int cx = cell(std::min(a.x(), b.x())); cx <= cell(std::max(a.x(), b.x())); ++cx)
                    for (int cy = cell(std::min(a.y(), b.y())); cy <= cell(std::max(a.y(), b.y())); ++cy) {
                        QVector<int>& list = cells_[key(cx, cy)];
                        if (list.isEmpty() || list.back() != w)
                            list.push_back(w);
                    }
            }
        }
    }

    // Wires that may pass through p (each at most once).
    const QVector<int>& near(QPoint p) const
    {
        static const QVector<int> none;
        auto it = cells_.find(key(cell(p.x()), cell(p.y())));
        return it == cells_.end() ? none : *it;
    }

private:
    static constexpr int kCell = 40;
    static int cell(int v) { return v >= 0 ? v / kCell : -((-v + kCell - 1) / kCell); }
    static quint64 key(int cx, int cy) { return (quint64(quint32(cx)) << 32) | quint32(cy); }
    QHash<quint64, QVector<int>> cells_;
};

}  // namespace

Connectivity deriveConnectivity(const DrawingSnapshot& d)
{
    // Elements: part terminals, marker terminals, grounds, wires.
    const int partBase = 0;
    const int markerBase = partBase + 2 * int(d.parts.size());
    const int groundBase = markerBase + 2 * int(d.markers.size());
    const int wireBase = groundBase + int(d.grounds.size());
    const int count = wireBase + int(d.wires.size());
    DisjointSets sets(count);

    // Every terminal-like point (part and marker terminals, ground pins).
    QVector<Endpoint> terminals;
    for (int i = 0; i < d.parts.size(); ++i)
        for (int t = 0; t < 2; ++t)
            terminals.push_back({d.parts[i].terminals[t], partBase + 2 * i + t});
    for (int i = 0; i < d.markers.size(); ++i)
        for (int t = 0; t < 2; ++t)
            terminals.push_back({d.markers[i].terminals[t], markerBase + 2 * i + t});
    for (int i = 0; i < d.grounds.size(); ++i)
        terminals.push_back({d.grounds[i].terminal, groundBase + i});

    std::vector<bool> joined(count, false);

    // Terminals at one point touch each other.
    QHash<QPoint, QVector<int>> terminalsAt;
    for (const Endpoint& t : terminals)
        terminalsAt[t.at].push_back(t.element);
    for (const QVector<int>& group : terminalsAt) {
        for (int k = 1; k < group.size(); ++k) {
            sets.join(group[0], group[k]);
            joined[group[0]] = joined[group[k]] = true;
        }
    }

    const WireCells cells(d.wires);

    // A terminal anywhere on a wire joins it.
    for (const Endpoint& t : terminals) {
        for (int w : cells.near(t.at)) {
            if (pointOnPolyline(t.at, d.wires[w].points)) {
                sets.join(t.element, wireBase + w);
                joined[t.element] = true;
            }
        }
    }

    // A wire end on another wire joins the two.
    QVector<bool> endTouches(2 * d.wires.size(), false);
    for (int w = 0; w < d.wires.size(); ++w) {
        const QVector<QPoint>& pts = d.wires[w].points;
        if (pts.isEmpty())
            continue;
        const QPoint ends[2] = {pts.front(), pts.back()};
        for (int e = 0; e < 2; ++e) {
            if (terminalsAt.contains(ends[e]))
                endTouches[2 * w + e] = true;
            for (int v : cells.near(ends[e])) {
                if (v != w && pointOnPolyline(ends[e], d.wires[v].points)) {
                    sets.join(wireBase + w, wireBase + v);
                    endTouches[2 * w + e] = true;
                }
            }
        }
    }

    // The same label is the same node; ground symbols carry the label "gnd".
    QMap<QString, int> labelOwner;
    const QString gnd = QString::fromLatin1(tauline::kGroundNode);
    for (int i = 0; i < d.grounds.size(); ++i) {
        auto it = labelOwner.find(gnd);
        if (it == labelOwner.end())
            labelOwner.insert(gnd, groundBase + i);
        else
            sets.join(*it, groundBase + i);
    }
    for (int w = 0; w < d.wires.size(); ++w) {
        const QString label = d.wires[w].label.trimmed();
        if (label.isEmpty())
            continue;
        auto it = labelOwner.find(label);
        if (it == labelOwner.end())
            labelOwner.insert(label, wireBase + w);
        else
            sets.join(*it, wireBase + w);
    }

    // Names: ground, then labels, then n1, n2... in creation order.
    QMap<int, QStringList> labelsOfRoot;
    QMap<int, QPoint> labelWhere;
    for (auto it = labelOwner.begin(); it != labelOwner.end(); ++it) {
        const int root = sets.find(it.value());
        labelsOfRoot[root].push_back(it.key());
        if (!labelWhere.contains(root) && it.value() >= wireBase)
            labelWhere[root] = d.wires[it.value() - wireBase].points.value(0);
    }
    QSet<QString> usedNames(labelOwner.keyBegin(), labelOwner.keyEnd());

    Connectivity c;
    QHash<int, int> nodeOfRoot;
    int autoNumber = 0;
    auto nodeOf = [&](int element) {
        const int root = sets.find(element);
        auto it = nodeOfRoot.find(root);
        if (it != nodeOfRoot.end())
            return *it;
        QString name;
        const QStringList labels = labelsOfRoot.value(root);
        if (labels.contains(gnd)) {
            name = gnd;
        } else if (!labels.isEmpty()) {
            name = labels.front();  // QMap order: alphabetical
        } else {
            do {
                name = QStringLiteral("n%1").arg(++autoNumber);
            } while (usedNames.contains(name));
        }
        if (labels.size() > 1)
            c.labelConflicts.push_back({labels, labelWhere.value(root)});
        const int node = int(c.nodeNames.size());
        c.nodeNames.push_back(name);
        nodeOfRoot.insert(root, node);
        if (name == gnd)
            c.groundNode = node;
        return node;
    };

    for (int i = 0; i < d.parts.size(); ++i) {
        const int a = partBase + 2 * i;
        c.partNodes.insert(d.parts[i].id, {nodeOf(a), nodeOf(a + 1)});
        c.partTerminalJoined.insert(d.parts[i].id, {bool(joined[a]), bool(joined[a + 1])});
    }
    for (int i = 0; i < d.markers.size(); ++i) {
        const int a = markerBase + 2 * i;
        c.markerNodes.insert(d.markers[i].id, {nodeOf(a), nodeOf(a + 1)});
        c.markerTerminalJoined.insert(d.markers[i].id, {bool(joined[a]), bool(joined[a + 1])});
    }
    for (int w = 0; w < d.wires.size(); ++w)
        c.wireNodes.insert(d.wires[w].id, nodeOf(wireBase + w));
    for (int i = 0; i < d.grounds.size(); ++i)
        c.groundNodes.insert(d.grounds[i].id, nodeOf(groundBase + i));

    // Dangling ends and junction dots.
    for (int w = 0; w < d.wires.size(); ++w) {
        const QVector<QPoint>& pts = d.wires[w].points;
        if (pts.size() < 2 || pts.front() == pts.back())
            continue;
        if (!endTouches[2 * w])
            c.danglingWireEnds.push_back(pts.front());
        if (!endTouches[2 * w + 1])
            c.danglingWireEnds.push_back(pts.back());
    }
    QSet<QPoint> candidates;
    for (const DrawnWire& wire : d.wires) {
        if (!wire.points.isEmpty()) {
            candidates.insert(wire.points.front());
            candidates.insert(wire.points.back());
        }
    }
    for (const Endpoint& t : terminals)
        candidates.insert(t.at);
    for (const QPoint& p : candidates) {
        int ends = int(terminalsAt.value(p).size());
        bool touchesWire = false;
        for (int w : cells.near(p)) {
            const DrawnWire& wire = d.wires[w];
            if (wire.points.size() < 2)
                continue;
            if (wire.points.front() == p)
                ++ends, touchesWire = true;
            if (wire.points.back() == p)
                ++ends, touchesWire = true;
            if (pointInsidePolyline(p, wire.points))
                ends += 2, touchesWire = true;
        }
        if (touchesWire && ends >= 3)
            c.junctions.push_back(p);
    }
    std::sort(c.junctions.begin(), c.junctions.end(),
              [](QPoint a, QPoint b) { return a.y() != b.y() ? a.y() < b.y() : a.x() < b.x(); });
    return c;
}

}  // namespace tauline::ui
