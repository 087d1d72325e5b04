#include "ui/panels/parts_panel.h"

#include "core/model/type_names.h"
#include "render/palette.h"
#include "ui/analysis/analysis_state.h"
#include "ui/document/mechanism_document.h"
#include "ui/document/sketch_geometry.h"

#include <QHeaderView>
#include <QTreeWidgetItemIterator>

namespace clevis::ui {
namespace {

constexpr int kKindRole = Qt::UserRole;
constexpr int kNameRole = Qt::UserRole + 1;
constexpr int kLoadRole = Qt::UserRole + 2;

QString jointDescription(const Joint& j)
{
    const auto body = [](const std::string& b) {
        return b.empty() ? QStringLiteral("(open)") : QString::fromStdString(b);
    };
    return QStringLiteral("%1 · %2–%3")
        .arg(QString::fromUtf8(jointTypeName(j.type)), body(j.bodies[0]), body(j.bodies[1]));
}

QString loadKind(const Load& l)
{
    static const char* kinds[] = {"force", "torque", "spring", "damper", "torsion spring"};
    return QString::fromUtf8(kinds[l.index()]);
}

Selection selectionOf(const QTreeWidgetItem* item)
{
    if (!item || item->data(0, kKindRole).isNull()) return {};
    return {Selection::Kind(item->data(0, kKindRole).toInt()), item->data(0, kNameRole).toString(),
            item->data(0, kLoadRole).toInt()};
}

// The same rows with the same words, roles and colours.
bool sameRows(const QTreeWidgetItem* a, const QTreeWidgetItem* b)
{
    if (a->childCount() != b->childCount()) return false;
    for (int c = 0; c < 2; ++c)
        if (a->text(c) != b->text(c) || a->foreground(c) != b->foreground(c)) return false;
    for (const int role : {kKindRole, kNameRole, kLoadRole})
        if (a->data(0, role) != b->data(0, role)) return false;
    for (int i = 0; i < a->childCount(); ++i)
        if (!sameRows(a->child(i), b->child(i))) return false;
    return true;
}

}  // namespace

PartsPanel::PartsPanel(MechanismDocument* doc, AnalysisState* analysis, QWidget* parent)
    : QTreeWidget(parent), doc_(doc), analysis_(analysis)
{
    setObjectName(QStringLiteral("partsPanel"));
    setColumnCount(2);
    setHeaderLabels({tr("Part"), tr("What")});
    header()->setSectionResizeMode(0, QHeaderView::ResizeToContents);
    setRootIsDecorated(true);
    connect(doc_, &MechanismDocument::mechanismChanged, this, &PartsPanel::rebuild);
    connect(doc_, &MechanismDocument::selectionChanged, this, &PartsPanel::showSelection);
    connect(analysis_, &AnalysisState::resultChanged, this, &PartsPanel::rebuild);
    connect(this, &QTreeWidget::itemSelectionChanged, this, &PartsPanel::pickRow);
    rebuild();
}

void PartsPanel::rebuild()
{
    const Mechanism& m = doc_->mechanism();
    const QStringList blamed = analysis_->offendingItems();
    QList<QTreeWidgetItem*> groups;
    const auto group = [&groups](const QString& title, std::size_t count) {
        auto* g = new QTreeWidgetItem(QStringList{title, QString::number(count)});
        g->setFlags(Qt::ItemIsEnabled);
        groups << g;
        return g;
    };
    const auto row = [&](QTreeWidgetItem* parent, Selection::Kind kind, const std::string& name, const QString& what,
                         int load = -1) {
        auto* item = new QTreeWidgetItem(parent, {QString::fromStdString(name), what});
        item->setData(0, kKindRole, int(kind));
        item->setData(0, kNameRole, QString::fromStdString(name));
        item->setData(0, kLoadRole, load);
        if (blamed.contains(QString::fromStdString(name))) {
            item->setForeground(0, palette::problem());
            item->setForeground(1, palette::problem());
        }
    };
    QTreeWidgetItem* bodies = group(tr("Bodies"), m.bodies.size());
    for (const auto& b : m.bodies)
        row(bodies, Selection::Kind::Body, b.name, bodyPins(m, b.name).size() > 2 ? tr("plate") : tr("link"));
    QTreeWidgetItem* joints = group(tr("Joints"), m.joints.size());
    for (const auto& j : m.joints) row(joints, Selection::Kind::Joint, j.name, jointDescription(j));
    QTreeWidgetItem* drivers = group(tr("Drivers"), m.drivers.size());
    for (const auto& d : m.drivers)
        row(drivers, Selection::Kind::Driver, d.name,
            d.type == DriverType::Rotary
                ? tr("motor at %1").arg(QString::fromStdString(d.joint))
                : (d.joint.empty() ? tr("cylinder") : tr("drive at %1").arg(QString::fromStdString(d.joint))));
    QTreeWidgetItem* loads = group(tr("Loads"), m.loads.size());
    for (std::size_t i = 0; i < m.loads.size(); ++i)
        row(loads, Selection::Kind::Load, loadName(m.loads[i], int(i)), loadKind(m.loads[i]), int(i));
    // A drag edits the document at every move of the mouse, most often with
    // every row unchanged: the tree, its layout and its painting are kept then.
    bool same = topLevelItemCount() == groups.size();
    for (int i = 0; same && i < groups.size(); ++i) same = sameRows(topLevelItem(i), groups[i]);
    if (same) {
        qDeleteAll(groups);
        return;
    }
    syncing_ = true;
    clear();
    addTopLevelItems(groups);
    for (QTreeWidgetItem* g : groups) g->setExpanded(true);
    syncing_ = false;
    showSelection();
}

void PartsPanel::showSelection()
{
    syncing_ = true;
    clearSelection();
    const Selection s = doc_->selection();
    for (QTreeWidgetItemIterator it(this); *it; ++it) {
        const Selection rowSel = selectionOf(*it);
        if (s.kind != Selection::Kind::None && rowSel.kind == s.kind &&
            (s.kind == Selection::Kind::Load ? rowSel.loadIndex == s.loadIndex : rowSel.name == s.name)) {
            (*it)->setSelected(true);
            scrollToItem(*it);
        }
    }
    syncing_ = false;
}

void PartsPanel::pickRow()
{
    if (syncing_) return;
    const auto items = selectedItems();
    Selection s = items.isEmpty() ? Selection{} : selectionOf(items.front());
    if (s.kind != Selection::Kind::Load) s.loadIndex = -1;
    if (s.kind == Selection::Kind::Load) s.name.clear();
    doc_->setSelection(s);
}

}  // namespace clevis::ui
