#include "SchematicView.h"

#include "SchematicDocument.h"
#include "SchematicItem.h"
#include "SchematicScene.h"

#include <QAction>
#include <QKeyEvent>
#include <QMouseEvent>
#include <QScrollBar>
#include <QWheelEvent>

#include <cmath>

namespace tauline::ui {

namespace {
constexpr double kMinZoom = 0.05;
constexpr double kMaxZoom = 8.0;
constexpr double kWheelZoomStep = 1.15;
}  // namespace

SchematicView::SchematicView(SchematicDocument* document, QWidget* parent)
    : QGraphicsView(document->scene(), parent), document_(document)
{
    setRenderHints(QPainter::Antialiasing | QPainter::TextAntialiasing);
    setDragMode(QGraphicsView::RubberBandDrag);
    setRubberBandSelectionMode(Qt::IntersectsItemShape);
    setTransformationAnchor(QGraphicsView::AnchorUnderMouse);
    setResizeAnchor(QGraphicsView::AnchorViewCenter);
    setViewportUpdateMode(QGraphicsView::BoundingRectViewportUpdate);
    setMouseTracking(true);
    setFocusPolicy(Qt::StrongFocus);
    setMinimumSize(200, 150);

    auto* zoomIn = new QAction(tr("Zoom &In"), this);
    zoomIn->setShortcuts(QKeySequence::ZoomIn);
    zoomIn->setShortcutContext(Qt::WidgetWithChildrenShortcut);
    connect(zoomIn, &QAction::triggered, this, [this] { zoomBy(1.25); });
    auto* zoomOut = new QAction(tr("Zoom &Out"), this);
    zoomOut->setShortcuts(QKeySequence::ZoomOut);
    zoomOut->setShortcutContext(Qt::WidgetWithChildrenShortcut);
    connect(zoomOut, &QAction::triggered, this, [this] { zoomBy(1 / 1.25); });
    auto* fit = new QAction(tr("&Fit Drawing"), this);
    fit->setShortcut(QKeySequence(Qt::CTRL | Qt::Key_0));
    fit->setShortcutContext(Qt::WidgetWithChildrenShortcut);
    connect(fit, &QAction::triggered, this, &SchematicView::fitDrawing);
    viewActions_ = {zoomIn, zoomOut, fit};

    // Shortcuts work while the canvas (or an editor in it) has focus.
    addActions(document->editActions());
    addActions(document->toolActions());
    addActions(viewActions_);

    connect(document, &SchematicDocument::drawingLoaded, this, &SchematicView::restoreOrFit);
}

QList<QAction*> SchematicView::viewActions() const
{
    return viewActions_;
}

double SchematicView::zoom() const
{
    return transform().m11();
}

void SchematicView::setZoom(double zoom)
{
    zoom = std::clamp(zoom, kMinZoom, kMaxZoom);
    setTransform(QTransform::fromScale(zoom, zoom));
    rememberViewState();
}

void SchematicView::zoomBy(double factor)
{
    const double target = std::clamp(zoom() * factor, kMinZoom, kMaxZoom);
    const double applied = target / zoom();
    scale(applied, applied);
    rememberViewState();
}

void SchematicView::fitDrawing()
{
    QRectF box;
    for (SchematicItem* item : document_->scene()->schematicItems()) {
        box = box.united(item->sceneBoundingRect());
        box = box.united(item->mapRectToScene(item->childrenBoundingRect()));  // labels
    }
    if (box.isNull())
        box = QRectF(-200, -150, 400, 300);
    box.adjust(-40, -40, 40, 40);
    const QSize area = viewport()->size();
    const double fitZoom = std::min(area.width() / box.width(), area.height() / box.height());
    restoring_ = true;
    setTransform(QTransform::fromScale(1, 1));
    setZoom(std::min(fitZoom, 1.6));
    centerOn(box.center());
    restoring_ = false;
    rememberViewState();
}

void SchematicView::restoreOrFit()
{
    if (!isVisible()) {
        pendingRestore_ = true;
        return;
    }
    pendingRestore_ = false;
    if (document_->hasViewState()) {
        const QPointF centre = document_->viewCentre();
        const double z = document_->viewZoom();
        restoring_ = true;
        setTransform(QTransform::fromScale(std::clamp(z, kMinZoom, kMaxZoom), std::clamp(z, kMinZoom, kMaxZoom)));
        centerOn(centre);
        restoring_ = false;
    } else {
        fitDrawing();
    }
}

void SchematicView::showEvent(QShowEvent* event)
{
    QGraphicsView::showEvent(event);
    if (pendingRestore_)
        restoreOrFit();
}

void SchematicView::rememberViewState()
{
    if (restoring_ || !isVisible())
        return;
    document_->setViewState(mapToScene(viewport()->rect().center()), zoom());
}

void SchematicView::scrollContentsBy(int dx, int dy)
{
    QGraphicsView::scrollContentsBy(dx, dy);
    rememberViewState();
}

void SchematicView::wheelEvent(QWheelEvent* event)
{
    if (event->modifiers() & Qt::ControlModifier) {
        const int notches = event->angleDelta().y();
        if (notches != 0)
            zoomBy(std::pow(kWheelZoomStep, notches / 120.0));
        event->accept();
        return;
    }
    QGraphicsView::wheelEvent(event);  // the scene steps a selected part's value, or we scroll
}

void SchematicView::mousePressEvent(QMouseEvent* event)
{
    if (event->button() == Qt::MiddleButton || (spaceHeld_ && event->button() == Qt::LeftButton)) {
        panning_ = true;
        panLast_ = event->position().toPoint();
        viewport()->setCursor(Qt::ClosedHandCursor);
        event->accept();
        return;
    }
    QGraphicsView::mousePressEvent(event);
}

void SchematicView::mouseMoveEvent(QMouseEvent* event)
{
    if (panning_) {
        const QPoint now = event->position().toPoint();
        const QPoint d = now - panLast_;
        panLast_ = now;
        horizontalScrollBar()->setValue(horizontalScrollBar()->value() - d.x());
        verticalScrollBar()->setValue(verticalScrollBar()->value() - d.y());
        event->accept();
        return;
    }
    QGraphicsView::mouseMoveEvent(event);
}

void SchematicView::mouseReleaseEvent(QMouseEvent* event)
{
    if (panning_ && (event->button() == Qt::MiddleButton || event->button() == Qt::LeftButton)) {
        panning_ = false;
        viewport()->setCursor(spaceHeld_ ? Qt::OpenHandCursor
                                         : (document_->scene()->tool() == SchematicScene::Tool::Select
                                                ? Qt::ArrowCursor
                                                : Qt::CrossCursor));
        event->accept();
        return;
    }
    QGraphicsView::mouseReleaseEvent(event);
}

void SchematicView::keyPressEvent(QKeyEvent* event)
{
    if (event->key() == Qt::Key_Space && !document_->scene()->activeEditor()) {
        if (!event->isAutoRepeat()) {
            spaceHeld_ = true;
            viewport()->setCursor(Qt::OpenHandCursor);
        }
        event->accept();
        return;
    }
    QGraphicsView::keyPressEvent(event);
}

void SchematicView::keyReleaseEvent(QKeyEvent* event)
{
    if (event->key() == Qt::Key_Space && spaceHeld_) {
        if (!event->isAutoRepeat()) {
            spaceHeld_ = false;
            if (!panning_)
                viewport()->setCursor(document_->scene()->tool() == SchematicScene::Tool::Select ? Qt::ArrowCursor
                                                                                                : Qt::CrossCursor);
        }
        event->accept();
        return;
    }
    QGraphicsView::keyReleaseEvent(event);
}

}  // namespace tauline::ui
