// The canvas view: zoom with Ctrl+wheel (about the mouse), pan with the middle
// button or Space+drag, fit the drawing; rubber-band selection on empty
// canvas. The plain wheel over a selected part steps its value (the scene
// takes it); elsewhere it scrolls.
#pragma once

#include <QGraphicsView>

namespace tauline::ui {

class SchematicDocument;

class SchematicView : public QGraphicsView {
    Q_OBJECT
public:
    explicit SchematicView(SchematicDocument* document, QWidget* parent = nullptr);

    SchematicDocument* document() const { return document_; }

    // Zoom in, zoom out (QKeySequence::ZoomIn/ZoomOut) and fit (Ctrl+0).
    QList<QAction*> viewActions() const;

    double zoom() const;
    void setZoom(double zoom);
    void zoomBy(double factor);
    void fitDrawing();

protected:
    void wheelEvent(QWheelEvent* event) override;
    void mousePressEvent(QMouseEvent* event) override;
    void mouseMoveEvent(QMouseEvent* event) override;
    void mouseReleaseEvent(QMouseEvent* event) override;
    void keyPressEvent(QKeyEvent* event) override;
    void keyReleaseEvent(QKeyEvent* event) override;
    void scrollContentsBy(int dx, int dy) override;
    void showEvent(QShowEvent* event) override;

private:
    void restoreOrFit();
    void rememberViewState();

    SchematicDocument* document_;
    QList<QAction*> viewActions_;
    bool spaceHeld_ = false;
    bool panning_ = false;
    QPoint panLast_;
    bool restoring_ = false;
    bool pendingRestore_ = true;
};

}  // namespace tauline::ui
