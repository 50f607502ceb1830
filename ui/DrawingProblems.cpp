#include "DrawingProblems.h"

#include "WireGeometry.h"

#include <QHash>
#include <QSet>

#include <map>
#include <set>
#include <vector>

namespace tauline::ui {

namespace {

bool shortedByOneWire(const DrawnPart& part, const DrawingSnapshot& d)
{
    for (const DrawnWire& w : d.wires) {
        if (pointOnPolyline(part.terminals[0], w.points) && pointOnPolyline(part.terminals[1], w.points))
            return true;
    }
    return false;
}

// Parts in pieces that touch none of the response's nodes.
QStringList partsCutOff(const tauline::Network& network)
{
    std::map<std::string, int> index;
    std::vector<int> parent;
    auto id = [&](const std::string& node) {
        auto [it, added] = index.emplace(node, int(parent.size()));
        if (added)
            parent.push_back(it->second);
        return it->second;
    };
    auto find = [&](int x) {
        while (parent[size_t(x)] != x) {
            parent[size_t(x)] = parent[size_t(parent[size_t(x)])];
            x = parent[size_t(x)];
        }
        return x;
    };
    for (const tauline::Part& p : network.parts) {
        const int a = find(id(p.nodes[0]));
        const int b = find(id(p.nodes[1]));
        if (a != b)
            parent[size_t(a)] = b;
    }
    std::set<int> live;
    const auto& r = network.response;
    for (const auto* nodes : {&r.input, &r.output})
        for (const std::string& n : *nodes)
            live.insert(find(id(n)));
    QStringList out;
    for (const tauline::Part& p : network.parts) {
        if (!live.count(find(id(p.nodes[0]))))
            out.push_back(QString::fromStdString(p.name));
    }
    return out;
}

}  // namespace

QList<DrawingProblem> findDrawingProblems(const DrawingSnapshot& d, const Connectivity& c,
                                          const DerivedNetwork& derived)
{
    QList<DrawingProblem> problems;
    for (const QPoint& p : c.danglingWireEnds)
        problems.push_back({QStringLiteral("This wire end is not connected"), QPointF(p), {}, true});

    const QSet<QString> shorted(derived.shortedParts.begin(), derived.shortedParts.end());
    QHash<QString, QPointF> partCentre;
    for (const DrawnPart& part : d.parts) {
        partCentre.insert(part.name, part.centre);
        const auto joined = c.partTerminalJoined.value(part.id);
        if (shorted.contains(part.name)) {
            const QString message = shortedByOneWire(part, d)
                                        ? QStringLiteral("%1 is shorted by a wire; it is left out").arg(part.name)
                                        : QStringLiteral("Both ends of %1 are on one node; it is left out")
                                              .arg(part.name);
            problems.push_back({message, part.centre, {part.name}, false});
        } else if (!joined[0] && !joined[1]) {
            problems.push_back({QStringLiteral("%1 is not connected to anything").arg(part.name), part.centre,
                                {part.name}, false});
        } else {
            for (int t = 0; t < 2; ++t) {
                if (!joined[t])
                    problems.push_back({QStringLiteral("This end of %1 is not connected").arg(part.name),
                                        QPointF(part.terminals[t]), {part.name}, true});
            }
        }
    }

    for (const LabelConflict& conflict : c.labelConflicts)
        problems.push_back({QStringLiteral("One node has several names: %1; it is called %2")
                                .arg(conflict.labels.join(QStringLiteral(", ")), conflict.labels.front()),
                            QPointF(conflict.where), {}, false});

    if (derived.hasResponse) {
        const QStringList cut = partsCutOff(derived.network);
        QStringList reported;
        for (const QString& name : cut) {
            // A floating part has its own message already.
            bool floating = false;
            for (const DrawnPart& part : d.parts) {
                if (part.name == name) {
                    const auto joined = c.partTerminalJoined.value(part.id);
                    floating = !joined[0] && !joined[1];
                }
            }
            if (!floating)
                reported.push_back(name);
        }
        if (!reported.isEmpty())
            problems.push_back({QStringLiteral("%1 %2 not connected to the response's nodes; the analysis "
                                               "leaves %3 out")
                                    .arg(reported.join(QStringLiteral(", ")),
                                         reported.size() == 1 ? QStringLiteral("is") : QStringLiteral("are"),
                                         reported.size() == 1 ? QStringLiteral("it") : QStringLiteral("them")),
                                partCentre.value(reported.front()), reported, false});
    }
    // What keeps the response from existing first (a caller showing one
    // message shows that), then the rest, open ends last.
    QList<DrawingProblem> ordered = derived.responseProblems;
    for (const DrawingProblem& p : problems)
        if (!p.minor)
            ordered.push_back(p);
    for (const DrawingProblem& p : problems)
        if (p.minor)
            ordered.push_back(p);
    return ordered;
}

}  // namespace tauline::ui
