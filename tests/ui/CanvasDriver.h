// Drives the schematic canvas the way a user does: mouse events on the view's
// viewport (scene coordinates in, pixels out), the canvas actions, the wheel.
#pragma once

#include "CanvasActions.h"
#include "SchematicDocument.h"
#include "SchematicScene.h"
#include "SchematicView.h"

#include <QApplication>
#include <QMouseEvent>
#include <QSettings>
#include <QTemporaryDir>
#include <QTest>
#include <QWheelEvent>

#include <catch2/catch.hpp>

namespace canvas_test {

using Tool = tauline::ui::SchematicScene::Tool;

// Settings written by a test (the value series) go to a throw-away place.
inline void isolateSettings()
{
    static QTemporaryDir dir;
    QSettings::setPath(QSettings::NativeFormat, QSettings::UserScope, dir.path());
    QSettings::setPath(QSettings::IniFormat, QSettings::UserScope, dir.path());
    QCoreApplication::setOrganizationName(QStringLiteral("tauline-canvas-tests"));
    QCoreApplication::setApplicationName(QStringLiteral("tauline-canvas-tests"));
}

struct Canvas {
    tauline::ui::SchematicDocument doc;
    tauline::ui::SchematicView view{&doc};

    Canvas()
    {
        isolateSettings();
        view.resize(1000, 700);
        view.show();
        REQUIRE(QTest::qWaitForWindowExposed(&view));
        view.setZoom(1.0);
        view.centerOn(0, 0);
    }

    tauline::ui::SchematicScene* scene() { return doc.scene(); }

    QPointF pixel(QPointF scenePoint) const { return QPointF(view.mapFromScene(scenePoint)); }

    void send(QEvent::Type type, QPointF scenePoint, Qt::MouseButton button, Qt::MouseButtons buttons,
              Qt::KeyboardModifiers modifiers = Qt::NoModifier)
    {
        const QPointF local = pixel(scenePoint);
        QMouseEvent event(type, local, view.viewport()->mapToGlobal(local), button, buttons, modifiers);
        QApplication::sendEvent(view.viewport(), &event);
    }

    void move(QPointF p, Qt::MouseButtons buttons = Qt::NoButton, Qt::KeyboardModifiers modifiers = Qt::NoModifier)
    {
        send(QEvent::MouseMove, p, Qt::NoButton, buttons, modifiers);
    }

    void click(QPointF p, Qt::KeyboardModifiers modifiers = Qt::NoModifier)
    {
        move(p);
        send(QEvent::MouseButtonPress, p, Qt::LeftButton, Qt::LeftButton, modifiers);
        send(QEvent::MouseButtonRelease, p, Qt::LeftButton, Qt::NoButton, modifiers);
    }

    void doubleClick(QPointF p)
    {
        click(p);
        send(QEvent::MouseButtonDblClick, p, Qt::LeftButton, Qt::LeftButton);
        send(QEvent::MouseButtonRelease, p, Qt::LeftButton, Qt::NoButton);
    }

    void drag(QPointF from, QPointF to, Qt::KeyboardModifiers modifiers = Qt::NoModifier, int steps = 6)
    {
        move(from);
        send(QEvent::MouseButtonPress, from, Qt::LeftButton, Qt::LeftButton, modifiers);
        for (int i = 1; i <= steps; ++i)
            move(from + (to - from) * (double(i) / steps), Qt::LeftButton, modifiers);
        send(QEvent::MouseButtonRelease, to, Qt::LeftButton, Qt::NoButton, modifiers);
    }

    void wheel(QPointF p, int notches, Qt::KeyboardModifiers modifiers = Qt::NoModifier)
    {
        const QPointF local = pixel(p);
        QWheelEvent event(local, view.viewport()->mapToGlobal(local), QPoint(), QPoint(0, 120 * notches),
                          Qt::NoButton, modifiers, Qt::NoScrollPhase, false);
        QApplication::sendEvent(view.viewport(), &event);
    }

    void useTool(Tool tool) { doc.actions()->tool(tool)->trigger(); }

    // Places a symbol with the tool, turned before it is dropped.
    void place(Tool tool, QPointF at, int quarterTurns = 0)
    {
        useTool(tool);
        move(at);
        for (int i = 0; i < quarterTurns; ++i)
            doc.actions()->rotate()->trigger();
        click(at);
        useTool(Tool::Select);
    }

    // Draws a wire with the wire tool, one click per point (the wire ends by
    // itself on a terminal or another wire).
    void wire(std::initializer_list<QPointF> points)
    {
        useTool(Tool::Wire);
        for (const QPointF& p : points)
            click(p);
        useTool(Tool::Select);
    }
};

inline const tauline::Part* findPart(const tauline::Network& network, const std::string& name)
{
    for (const tauline::Part& p : network.parts)
        if (p.name == name)
            return &p;
    return nullptr;
}

inline bool hasProblem(const tauline::ui::SchematicDocument& doc, const QString& fragment)
{
    for (const auto& problem : doc.problems())
        if (problem.message.contains(fragment))
            return true;
    return false;
}

// An RC low-pass drawn entirely with the mouse (coordinates on the 10-unit
// grid):  input + -> R1 -> node -> C1 -> ground, output + on the node; both
// markers' − terminals left open, i.e. on ground.
//   R1 at (0,0) lying down: terminals (−20,0), (20,0)
//   C1 at (60,40) turned once: terminals (60,20), (60,60)
//   ground pin at (60,100); input at (−80,40); output at (120,40)
inline std::vector<tauline::Network> drawLowPass(Canvas& c)
{
    std::vector<tauline::Network> after;
    auto record = [&] { after.push_back(c.doc.network()); };
    c.place(Tool::Resistor, {0, 0});
    record();
    c.place(Tool::Capacitor, {60, 40}, 1);
    record();
    c.place(Tool::Ground, {60, 100});
    record();
    c.place(Tool::Input, {-80, 40});
    record();
    c.place(Tool::Output, {120, 40});
    record();
    c.wire({{20, 0}, {60, 20}});  // R1 right end, bend at (60,0), down to C1
    record();
    // From the input's + terminal with the select tool: a press on a
    // terminal starts a wire there.
    c.click({-80, 20});
    c.click({-20, 0});
    record();
    c.wire({{60, 60}, {60, 100}});  // C1 to ground
    record();
    c.wire({{120, 20}, {60, 0}});  // output + up and across onto the first wire's corner
    record();
    return after;
}

}  // namespace canvas_test
