#include "DerivedNetwork.h"

#include <QSet>

namespace tauline::ui {

namespace {

QString roleText(MarkerRole role)
{
    switch (role) {
    case MarkerRole::Port: return QStringLiteral("port");
    case MarkerRole::Input: return QStringLiteral("input");
    case MarkerRole::Output: return QStringLiteral("output");
    }
    return {};
}

// The + and − nodes of a marker, or an explanation of why it has none.
struct MarkerNodes {
    QString plus;
    QString minus;
    bool ok = false;
};

MarkerNodes markerNodes(const DrawnMarker& m, const Connectivity& c, const QSet<QString>& partNodes,
                        QList<DrawingProblem>& problems)
{
    MarkerNodes out;
    const auto nodes = c.markerNodes.value(m.id);
    const auto joined = c.markerTerminalJoined.value(m.id);
    const QString what = roleText(m.role);
    if (!joined[0]) {
        problems.push_back({QStringLiteral("The %1's + terminal is not connected").arg(what),
                            QPointF(m.terminals[0]), {}, false});
        return out;
    }
    out.plus = c.nodeName(nodes[0]);
    out.minus = joined[1] ? c.nodeName(nodes[1]) : QString::fromLatin1(tauline::kGroundNode);
    if (out.plus == out.minus) {
        problems.push_back({QStringLiteral("Both terminals of the %1 are on one node").arg(what),
                            m.centre, {}, false});
        return out;
    }
    for (const QString& node : {out.plus, out.minus}) {
        if (partNodes.contains(node))
            continue;
        if (node == QLatin1String(tauline::kGroundNode) && !joined[1]) {
            problems.push_back({QStringLiteral("Nothing is grounded: add a ground symbol, or wire the "
                                               "%1's − terminal")
                                    .arg(what),
                                QPointF(m.terminals[1]), {}, false});
        } else {
            problems.push_back({QStringLiteral("The %1 is on node %2, which no part touches").arg(what, node),
                                m.centre, {}, false});
        }
        return out;
    }
    out.ok = true;
    return out;
}

}  // namespace

DerivedNetwork deriveNetwork(const DrawingSnapshot& d, const Connectivity& c)
{
    DerivedNetwork out;
    out.network.title = d.title.toStdString();
    QSet<QString> partNodes;
    for (const DrawnPart& p : d.parts) {
        const auto nodes = c.partNodes.value(p.id);
        if (nodes[0] == nodes[1]) {
            out.shortedParts.push_back(p.name);
            continue;
        }
        tauline::Part part;
        part.name = p.name.toStdString();
        part.kind = p.kind;
        part.value = p.value;
        part.valueText = p.valueText.toStdString();
        part.nodes = {c.nodeName(nodes[0]).toStdString(), c.nodeName(nodes[1]).toStdString()};
        out.network.parts.push_back(std::move(part));
        partNodes.insert(c.nodeName(nodes[0]));
        partNodes.insert(c.nodeName(nodes[1]));
    }

    QVector<const DrawnMarker*> ports, inputs, outputs;
    for (const DrawnMarker& m : d.markers) {
        if (m.role == MarkerRole::Port)
            ports.push_back(&m);
        else if (m.role == MarkerRole::Input)
            inputs.push_back(&m);
        else
            outputs.push_back(&m);
    }
    QList<DrawingProblem>& problems = out.responseProblems;
    auto first = [&](const QVector<const DrawnMarker*>& a, const QVector<const DrawnMarker*>& b) {
        return !a.isEmpty() ? a.front()->centre : (!b.isEmpty() ? b.front()->centre : QPointF());
    };

    if (ports.isEmpty() && inputs.isEmpty() && outputs.isEmpty()) {
        QPointF where;
        if (!d.parts.isEmpty()) {
            where = d.parts.front().centre;
            for (const DrawnPart& p : d.parts)
                where = QPointF(std::min(where.x(), p.centre.x()), std::min(where.y(), p.centre.y()));
            where += QPointF(-30, -40);
        }
        problems.push_back({QStringLiteral("No response yet: place a port, or an input and an output"),
                            where, {}, false});
        return out;
    }
    if (ports.size() > 1 || inputs.size() > 1 || outputs.size() > 1) {
        const auto& many = ports.size() > 1 ? ports : (inputs.size() > 1 ? inputs : outputs);
        problems.push_back({QStringLiteral("More than one %1 marker: keep one").arg(roleText(many.front()->role)),
                            many.back()->centre, {}, false});
        return out;
    }
    if (!ports.isEmpty() && (!inputs.isEmpty() || !outputs.isEmpty())) {
        problems.push_back({QStringLiteral("A port and input/output markers: keep either the port "
                                           "or the input and output"),
                            ports.front()->centre, {}, false});
        return out;
    }
    if (ports.isEmpty() && (inputs.isEmpty() || outputs.isEmpty())) {
        problems.push_back({inputs.isEmpty() ? QStringLiteral("An output needs an input marker")
                                             : QStringLiteral("An input needs an output marker"),
                            first(inputs, outputs), {}, false});
        return out;
    }

    tauline::ResponseSpec response;
    if (!ports.isEmpty()) {
        const MarkerNodes port = markerNodes(*ports.front(), c, partNodes, problems);
        if (!port.ok)
            return out;
        response.kind = tauline::ResponseKind::Impedance;
        response.input = {port.plus.toStdString(), port.minus.toStdString()};
        response.output = response.input;
    } else {
        const MarkerNodes in = markerNodes(*inputs.front(), c, partNodes, problems);
        const MarkerNodes outNodes = markerNodes(*outputs.front(), c, partNodes, problems);
        if (!in.ok || !outNodes.ok)
            return out;
        response.kind = inputs.front()->drive == DriveKind::Current ? tauline::ResponseKind::Transimpedance
                                                                     : tauline::ResponseKind::VoltageGain;
        response.input = {in.plus.toStdString(), in.minus.toStdString()};
        response.output = {outNodes.plus.toStdString(), outNodes.minus.toStdString()};
    }
    out.network.response = response;
    out.hasResponse = true;
    return out;
}

}  // namespace tauline::ui
