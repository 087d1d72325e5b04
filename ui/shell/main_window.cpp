#include "ui/shell/main_window.h"

#include "ui/analysis/analysis_state.h"
#include "ui/canvas/canvas_view.h"
#include "ui/canvas/cursor_readout.h"
#include "ui/canvas/tool_palette.h"
#include "ui/document/mechanism_document.h"
#include "ui/document/mechanism_edits.h"
#include "ui/files/autosave_timer.h"
#include "ui/files/file_actions.h"
#include "ui/panels/parts_panel.h"
#include "ui/panels/property_editor.h"
#include "ui/panels/status_line.h"
#include "ui/shell/dock_layout.h"
#include "ui/shell/menu_action.h"
#include "ui/shell/units_menu.h"

#include "ui/results/results_views.h"

#include <QCloseEvent>
#include <QDockWidget>
#include <QGuiApplication>
#include <QMenuBar>
#include <QMimeData>
#include <QScreen>
#include <QStatusBar>
#include <QToolBar>
#include <QWindow>

namespace clevis::ui {
namespace {

// A key bound twice (the platform's standard keys often repeat ours) makes
// Qt call the shortcut ambiguous and do nothing.
QList<QKeySequence> withoutRepeats(const QList<QKeySequence>& keys)
{
    QList<QKeySequence> unique;
    for (const QKeySequence& k : keys)
        if (!k.isEmpty() && !unique.contains(k)) unique << k;
    return unique;
}

}  // namespace

MainWindow::MainWindow(const QString& recoveryFolder, QWidget* parent)
    : QMainWindow(parent)
    , doc_(new MechanismDocument(this))
    , analysis_(new AnalysisState(doc_, this))
    , canvas_(new CanvasView(doc_, analysis_, this))
    , files_(new FileActions(this, doc_))
    , autosave_(new AutosaveTimer(doc_, RecoveryStore(recoveryFolder), this))
    , tools_(new ToolPalette(canvas_, this))
    , status_(new StatusLine(analysis_, this))
{
    setObjectName(QStringLiteral("mainWindow"));
    setCentralWidget(canvas_);
    setAcceptDrops(true);
    statusBar()->addWidget(status_, 1);
    auto* cursor = new CursorReadout(this);
    statusBar()->addPermanentWidget(cursor);
    connect(canvas_, &CanvasView::pointerMoved, cursor, &CursorReadout::show);
    connect(canvas_, &CanvasView::pointerLeft, cursor, &CursorReadout::clear);
    connect(canvas_, &CanvasView::hintChanged, status_, &StatusLine::showHint);
    connect(files_, &FileActions::note, status_, &StatusLine::showHint);
    connect(autosave_, &AutosaveTimer::note, status_, &StatusLine::showHint);
    connect(doc_, &MechanismDocument::editRefused, status_, &StatusLine::showHint);  // edits from the canvas and menus
    buildDocks();
    QMenu* view = buildMenus();
    status_->showHint(canvas_->tool()->hint());
    installResultsViews(this, doc_, analysis_);
    listPanels(view);
    placeOn(QGuiApplication::primaryScreen()->availableGeometry());
}

MainWindow::~MainWindow()
{
    // Before the document: its undo stack, cleared as it is destroyed, would
    // look like a saved document and delete the recovery file that a window
    // closed without the clean-exit path must leave.
    delete autosave_;
}

bool MainWindow::placeOn(const QRect& available)
{
    const bool small = available.width() < 1600 || available.height() < 960;
    // The frame is known once the window has been shown; a window manager maximising the window allows for it.
    QRect placed = available.marginsRemoved(windowHandle() ? windowHandle()->frameMargins() : QMargins());
    if (!small) {
        placed.setSize(available.size() * 0.9);
        placed.moveCenter(available.center());
    }
    setGeometry(placed);
    resetLayout();
    return small;
}

void MainWindow::showOn(const QRect& available)
{
    if (placeOn(available)) showMaximized();
    else show();
    activateWindow();
    canvas_->setFocus();
}

void MainWindow::resetLayout()
{
    for (QToolBar* bar : findChildren<QToolBar*>()) {
        addToolBar(Qt::TopToolBarArea, bar);
        bar->show();
    }
    arrangePanels(this);
}

void MainWindow::buildDocks()
{
    addPanel(this, tr("Parts"), QStringLiteral("partsDock"), new PartsPanel(doc_, analysis_), {180, 90});
    addPanel(this, tr("Properties"), QStringLiteral("propertiesDock"), new PropertyEditor(doc_, analysis_), {220, 140});
}

QMenu* MainWindow::buildMenus()
{
    files_->fill(menuBar()->addMenu(tr("&File")));

    QMenu* edit = menuBar()->addMenu(tr("&Edit"));
    QAction* undo = doc_->undoStack()->createUndoAction(this, tr("Undo"));
    undo->setShortcut(QKeySequence::Undo);
    QAction* redo = doc_->undoStack()->createRedoAction(this, tr("Redo"));
    const QList<QKeySequence> redoKeys{QKeySequence(Qt::CTRL | Qt::SHIFT | Qt::Key_Z),
                                       QKeySequence(Qt::CTRL | Qt::Key_Y)};
    redo->setShortcuts(withoutRepeats(redoKeys + QKeySequence::keyBindings(QKeySequence::Redo)));
    edit->addAction(undo);
    edit->addAction(redo);
    edit->addSeparator();
    QAction* del =
        addMenuAction(edit, tr("&Delete selected part"), QKeySequence::Delete, this, [this] { deleteSelection(); });
    del->setShortcuts(
        withoutRepeats(QKeySequence::keyBindings(QKeySequence::Delete) << QKeySequence(Qt::Key_Backspace)));

    QMenu* draw = menuBar()->addMenu(tr("&Draw"));
    auto* bar = new QToolBar(tr("Drawing tools"), this);
    bar->setObjectName(QStringLiteral("drawingTools"));
    bar->setToolButtonStyle(Qt::ToolButtonTextUnderIcon);
    bar->setIconSize(QSize(24, 24));
    addToolBar(Qt::TopToolBarArea, bar);
    tools_->fill(draw, bar);

    QMenu* view = menuBar()->addMenu(tr("&View"));
    addMenuAction(view, tr("&Fit to window"), QKeySequence(Qt::Key_Home), canvas_, [this] { canvas_->fitToView(); });
    addMenuAction(view, tr("Zoom &in"), QKeySequence::ZoomIn, canvas_, [this] { canvas_->zoomBy(1.25); });
    addMenuAction(view, tr("Zoom &out"), QKeySequence::ZoomOut, canvas_, [this] { canvas_->zoomBy(0.8); });
    menuBar()->addMenu(createUnitsMenu(this));
    return view;
}

// After every panel exists, so that a closed one can always be found again here.
void MainWindow::listPanels(QMenu* view)
{
    view->addSeparator();
    for (QDockWidget* dock : findChildren<QDockWidget*>()) view->addAction(dock->toggleViewAction());
    for (QToolBar* bar : findChildren<QToolBar*>()) view->addAction(bar->toggleViewAction());
    view->addSeparator();
    addMenuAction(view, tr("&Reset layout"), QKeySequence(), this, [this] { resetLayout(); });
}

void MainWindow::deleteSelection()
{
    const Selection s = doc_->selection();
    if (s.kind == Selection::Kind::None) return;
    const QString what = s.kind == Selection::Kind::Load ? tr("load") : s.name;
    std::vector<std::string> released;
    const QString refused =
        doc_->apply(tr("Delete %1").arg(what), [s, &released](Mechanism& m) { released = edits::remove(m, s); });
    if (!refused.isEmpty() || released.empty()) return;
    QStringList names;
    for (const auto& n : released) names << QString::fromStdString(n);
    status_->showHint(tr("%1 no longer follows a driver: it now acts at its nominal value throughout the cycle.")
                          .arg(names.join(", ")));
}

void MainWindow::closeEvent(QCloseEvent* e)
{
    if (!files_->maybeSave()) {
        e->ignore();
        return;
    }
    // Saved or knowingly discarded: a clean exit leaves nothing to recover.
    autosave_->discard();
    e->accept();
}

void MainWindow::dragEnterEvent(QDragEnterEvent* e)
{
    if (e->mimeData()->hasUrls() && e->mimeData()->urls().front().isLocalFile()) e->acceptProposedAction();
}

void MainWindow::dropEvent(QDropEvent* e)
{
    const QString path = e->mimeData()->urls().front().toLocalFile();
    if (files_->openWithPrompt(path)) e->acceptProposedAction();
}

}  // namespace clevis::ui
