package sheet

import (
	"fmt"
	"io"
	"math"
	"sort"
	"strings"
	"time"

	"arcwright/internal/planner"
)

// Sheet layout, mm. The drawing border keeps 20 mm at the left for filing
// and 10 mm elsewhere (ISO 5457, acoustics.md §8.3, FROM MEMORY).
const (
	marginLeft  = 20.0
	marginOther = 10.0
	titleH      = 52.0 // title block height
	stripH      = 15.0 // strip under the plan view for the scale bar and caption
	viewPad     = 10.0 // space inside a view frame kept clear of the drawing, for grid labels and labels
	gapMM       = 3.0  // gap between panels
)

// Font sizes, pt.
const (
	sizeID      = 5.5 // station IDs on the plan
	sizeNumber  = 4.5 // key numbers on the plan
	sizeSmall   = 5.0 // grid labels, angle labels, callouts
	sizeBody    = 6.5 // panels and set-up steps
	sizeTable   = 6.0 // tables
	sizeHeading = 8.5 // section headings
	sizeCaution = 11  // the signal word of the safety panel
)

// builder holds what Build works with.
type builder struct {
	plan  *planner.Plan
	req   *planner.Request
	gov   *planner.PointResult
	lim   planner.Limits
	pr    printer
	m     *meter
	model *Model

	frame   Rect // drawing border
	colW    float64
	byArray map[string][]*planner.Station

	gridStep  float64  // plan grid spacing, m
	keyPlaced bool     // the label key is on sheet 1
	zs        zoneSet  // the zones drawn
	ranges    string   // the first range label on the plan, "" if none
	cropped   bool     // the plan shows the region of interest, not the whole cell
	details   []detail // the detail views of dense arrays
	// warningsShown are the plan's warnings (indices in Plan.Warnings)
	// printed in full on sheet 1
	warningsShown map[int]bool
	// safetySize is the type size of the safety content on sheet 1, pt
	safetySize float64
	// notesLater are the notes on the plan when they did not fit sheet 1
	notesLater []string
	// legendLater: the legend did not fit sheet 1 and opens the flow
	// after the set-up steps
	legendLater bool
	// hazardsDrawn are the hazards marked on the plan
	hazardsDrawn []hazard
	noise        *planner.NoiseMap // the predicted noise contours; nil when noiseErr says why
	noiseErr     error
	// figures are the figures of the later sheets, tables and absorption
	// their tables, laid out once
	figures    map[string][]block
	tables     map[string]*laidTable
	absorption []*laidTable
}

// Build lays out the sheet set of plan p: pages, scale, every drawn item's
// position in mm, label placement, and tables split across pages. It reads
// the plan and does not change it.
//
// It returns an error wrapping [ErrUnknownPaper] for an unknown paper,
// [ErrScale] for a scale that is not positive or does not fit (naming the
// option and the scale that would fit), and [ErrInvalidPlan] when the plan
// misses a part or holds a NaN or infinite number where one is printed.
func Build(p *planner.Plan, opt Options) (*Model, error) {
	if err := validate(p); err != nil {
		return nil, err
	}
	req := p.Request
	paper, err := resolvePaper(opt, req)
	if err != nil {
		return nil, err
	}
	asked, field, err := resolveScale(opt, req)
	if err != nil {
		return nil, err
	}
	b := &builder{
		plan: p, req: req, gov: &p.Points[p.Governing], lim: limits(req.Limits),
		pr: printer{sys: req.Units, conv: req.Convention}, m: newMeter(),
		model: &Model{Paper: paper}, warningsShown: map[int]bool{},
	}
	b.frame = Rect{marginLeft, marginOther, paper.Width - marginLeft - marginOther, paper.Height - 2*marginOther}
	b.colW = columnWidth(b.frame.W)
	b.byArray = make(map[string][]*planner.Station)
	for i := range p.Stations {
		s := &p.Stations[i]
		b.byArray[s.Array] = append(b.byArray[s.Array], s)
	}
	for _, ss := range b.byArray {
		sort.SliceStable(ss, func(i, j int) bool { return ss[i].Index < ss[j].Index })
	}
	b.dates()
	m := b.model
	m.Units = req.Units.String()
	m.Convention = b.pr.convention()
	m.Governing = b.gov.Name
	m.Title = clean(req.Title.Title)

	b.zs = b.zones()
	b.noise, b.noiseErr = p.NoiseMap()
	if err := b.planPage(asked, field); err != nil {
		return nil, err
	}
	b.continuation()
	b.pointers()
	b.finish()
	return m, nil
}

// Write lays out the sheet set of p and writes it as PDF to w: [Build]
// followed by [Model.Render].
func Write(w io.Writer, p *planner.Plan, opt Options) error {
	m, err := Build(p, opt)
	if err != nil {
		return err
	}
	return m.Render(w)
}

// issueLayouts are the date layouts read from the title block's date for the
// PDF's creation date.
var issueLayouts = []string{"2006-01-02", "2006/01/02", "02.01.2006", "2 Jan 2006", "2 January 2006", "January 2, 2006", "Jan 2, 2006"}

// Undated is the creation date written into the PDF of a layout without a
// readable title date (00:00 UTC on 1 January 2000), so that the same
// layout gives the same bytes on every machine, in every time zone, on
// every day. Give the layout a date (title: date: 2026-03-14) to date the
// sheet.
var Undated = time.Date(2000, 1, 1, 0, 0, 0, 0, time.UTC)

// undatedText is the issue date printed when the layout gives none.
const undatedText = "not dated (title: date)"

// dates sets the issue date printed and the PDF's fixed creation and
// modification date: the title block's date, and that date at 00:00 UTC
// when it reads as a date, else [Undated]. No clock is read.
func (b *builder) dates() {
	given := strings.TrimSpace(b.req.Title.Date)
	b.model.IssueDate = clean(given)
	b.model.Created = Undated
	if given == "" {
		b.model.IssueDate = undatedText
		return
	}
	for _, l := range issueLayouts {
		if t, err := time.Parse(l, given); err == nil {
			b.model.Created = time.Date(t.Year(), t.Month(), t.Day(), 0, 0, 0, 0, time.UTC)
			return
		}
	}
}

// finish numbers the pages and draws the frame and title block on each.
func (b *builder) finish() {
	n := len(b.model.Pages)
	for i := range b.model.Pages {
		pg := &b.model.Pages[i]
		pg.Number = i + 1
		pg.Frame = b.frame
		pg.Shapes = append([]Shape{rectShape(StyleFrame, b.frame)}, pg.Shapes...)
		b.titleBlock(pg, n)
	}
}

// clamp returns v limited to [lo, hi].
func clamp(v, lo, hi float64) float64 {
	if v < lo {
		return lo
	}
	if v > hi {
		return hi
	}
	return v
}

// rectShape returns the closed rectangle r as a polygon of style s.
func rectShape(s Style, r Rect) Shape {
	return Shape{Kind: Polygon, Style: s, Points: []Pt{{r.X, r.Y}, {r.Right(), r.Y}, {r.Right(), r.Bottom()}, {r.X, r.Bottom()}}}
}

// line returns the polyline through pts.
func line(s Style, pts ...Pt) Shape { return Shape{Kind: Polyline, Style: s, Points: pts} }

// poly returns the polygon with ring pts and holes.
func poly(s Style, pts []Pt, holes ...[]Pt) Shape {
	return Shape{Kind: Polygon, Style: s, Points: pts, Holes: holes}
}

// circle returns the circle of centre c and radius r, mm.
func circle(s Style, c Pt, r float64) Shape {
	return Shape{Kind: Circle, Style: s, Points: []Pt{c}, R: r}
}

// text returns a line of text with its baseline at (x, y).
func (b *builder) text(x, y, size float64, bold bool, s string) Text {
	return Text{X: x, Y: y, Size: size, Bold: bold, Text: clean(s)}
}

// continuation lays out the sheets after the first: the set-out table
// opens sheet 2, then the set-up steps, the elevation and the clearance
// view, the details, the label key (when it did not fit on sheet 1), the
// tables and the warnings that did not fit sheet 1, each filling the space
// the one before left.
func (b *builder) continuation() {
	defer b.detailsNote()
	f := newFlow(b)
	first := len(b.model.Pages)
	b.flowSheets(f)
	// balance the last sheet: when it is less than 40 % full, raise the
	// foot of the sheet before by a tenth of a sheet, two tenths, … half a
	// sheet, so that more runs on to the last, and keep the layout whose
	// emptier sheet of the two is fullest (on as many sheets)
	n := f.pages
	area := f.area.W * f.area.H
	if n < 2 || b.usedArea(&b.model.Pages[len(b.model.Pages)-1]) >= 0.4*area {
		return
	}
	score := func(pages []Page) float64 {
		return math.Min(b.usedArea(&pages[len(pages)-2]), b.usedArea(&pages[len(pages)-1]))
	}
	best := b.model.Pages
	top := score(best)
	for k := 1; k <= 5; k++ {
		b.model.Pages = best[:first:first]
		g := newFlow(b)
		g.short, g.foot = n-1, f.ends[n-2]-float64(k)*0.1*f.area.H
		b.flowSheets(g)
		if s := score(b.model.Pages); g.pages == n && s > top {
			best, top = b.model.Pages, s
		}
	}
	b.model.Pages = best
}

// pointers puts the numbers of the sheets that the pointers on sheet 1
// name: the first sheet after it that carries the heading pointed to.
func (b *builder) pointers() {
	for _, k := range []struct{ prefix, heading string }{
		{"Notes on the plan: ", notesHeading},
		{"Legend of the plan: ", legendHeading},
		{"", warningsHeading},
	} {
		n := 0
		for i := 1; i < len(b.model.Pages) && n == 0; i++ {
			for _, t := range b.model.Pages[i].Texts {
				if strings.HasPrefix(t.Text, k.heading) {
					n = i + 1
					break
				}
			}
		}
		if n == 0 {
			continue
		}
		pg := &b.model.Pages[0]
		for j := range pg.Texts {
			t := pg.Texts[j].Text
			if !strings.Contains(t, laterMark) {
				continue
			}
			if k.prefix != "" && strings.HasPrefix(t, k.prefix) || k.prefix == "" && !strings.HasPrefix(t, "Notes on the plan: ") && !strings.HasPrefix(t, "Legend of the plan: ") {
				pg.Texts[j].Text = strings.Replace(t, laterMark, fmt.Sprintf("sheet %d", n), 1)
			}
		}
	}
}

// detailsLater ends the plan's note on the detail views as the plan view
// writes it (details.go).
const detailsLater = "enlarged on the first sheet after this one."

// detailsNote makes the plan's note on the detail views name the sheet the
// first of them is on, which the flow decides.
func (b *builder) detailsNote() {
	for i := 1; i < len(b.model.Pages); i++ {
		for _, v := range b.model.Pages[i].Views {
			if !strings.HasPrefix(v.Name, "detail") {
				continue
			}
			pg := &b.model.Pages[0]
			for j := range pg.Texts {
				if t := pg.Texts[j].Text; strings.HasSuffix(t, detailsLater) {
					pg.Texts[j].Text = strings.TrimSuffix(t, detailsLater) + fmt.Sprintf("enlarged on sheet %d.", i+1)
				}
			}
			return
		}
	}
}

// usedArea returns the area the tables, views and texts of pg cover, mm²
// (overlaps counted twice).
func (b *builder) usedArea(pg *Page) float64 {
	a := 0.0
	for i := range pg.Tables {
		a += pg.Tables[i].W() * pg.Tables[i].H()
	}
	for _, v := range pg.Views {
		a += v.Frame.W * v.Frame.H
	}
	for _, t := range pg.Texts {
		a += b.m.width(t.Text, t.Size, t.Bold) * lineHeight(t.Size)
	}
	return a
}

// laidTable returns the table name made by mk, laid out once per sheet set.
func (b *builder) laidTable(f *flow, name string, mk func() tableSpec) *laidTable {
	lt, ok := b.tables[name]
	if !ok {
		lt = b.layTable(mk(), f.area.W)
		if b.tables == nil {
			b.tables = make(map[string]*laidTable)
		}
		b.tables[name] = lt
	}
	return lt
}

// flowSheets lays out the sheets after the first on f.
func (b *builder) flowSheets(f *flow) {
	// the set-out table opens a sheet of its own
	f.newPage()
	f.placeTable(b.laidTable(f, "setout", b.setOutTable))
	f.gap(4)
	f.columns("SET-UP STEPS (for this plan; positions from the datum)", b.steps())
	f.gap(3)
	if b.legendLater {
		f.figures("legend", func(g *flow) {
			w := math.Min(g.area.W, b.colW-3)
			g.y = b.legend(g.page, Rect{g.area.X, g.y, w, 0})
		})
		f.gap(3)
	}
	if len(b.notesLater) > 0 {
		var ls []textLine
		for _, n := range b.notesLater {
			ls = append(ls, textLine{text: n, whole: true})
		}
		f.columns(notesHeading, ls)
		f.gap(3)
	}
	// every warning not printed in full on sheet 1, each whole
	var ls []textLine
	for i, w := range b.plan.Warnings {
		if !b.warningsShown[i] {
			ls = append(ls, textLine{text: "• " + w, whole: true})
		}
	}
	if len(ls) > 0 {
		f.columns(warningsHeading, ls)
		f.gap(3)
	}
	f.figures("views", b.sideViews)
	f.figures("details", func(g *flow) { g.details(b.details) })
	if len(b.model.Key) > 0 && !b.keyPlaced {
		f.figures("key", func(g *flow) {
			h := b.keyHeight(g.area.W)
			b.keyPanel(g.page, Rect{g.area.X, g.y, g.area.W, h})
			g.y += h
		})
	}
	for _, k := range []struct {
		name string
		mk   func() tableSpec
	}{{"stations", b.stationTable}, {"arrays", b.arraysTable}, {"points", b.pointsTable}, {"levels", b.levelTable}, {"crew", b.crewTable}} {
		if k.name == "crew" && len(b.plan.Crew) == 0 {
			continue
		}
		if lt := b.laidTable(f, k.name, k.mk); len(lt.rows) > 0 || k.name != "levels" {
			f.gap(3)
			f.placeTable(lt)
		}
	}
	if b.absorption == nil {
		for _, t := range b.absorptionTables() {
			b.absorption = append(b.absorption, b.layTable(t, f.area.W))
		}
	}
	for _, lt := range b.absorption {
		f.gap(3)
		f.placeTable(lt)
	}
	f.flush()
}

// sideViews lays out the elevation and the clearance view on the scratch
// flow f, side by side when they fit so, each with its title and scale
// under it.
func (b *builder) sideViews(f *flow) {
	sys := b.req.Units
	// the elevation and the clearance view share the horizontal scale
	sx := 0
	prevRight, rowTop, rowBottom := 0.0, f.y, f.y
	for _, sv := range []struct {
		title string
		make  func(x, y, w, maxH float64, sx int) (*sideView, bool)
	}{
		{b.elevationTitle(), b.elevation},
		{"CLEARANCE VIEW — the jet's meridional half-plane: x downstream of the exit, r the distance from the jet axis; each station at its true x and r, so it is clear of a zone drawn here exactly when its mark is outside the zone's outline. Zones bent by buoyancy or carried along a surface (wall jets) are not bodies of revolution and are not drawn here: a station they block is ringed; see the plan", b.clearance},
	} {
		// beside the previous view when that leaves a column of 120 mm,
		// else below it
		x, w := f.area.X, f.area.W
		if prevRight > 0 && f.area.Right()-(prevRight+6) >= 120 {
			x, w = prevRight+6, f.area.Right()-(prevRight+6)
			f.y = rowTop
		} else {
			rowTop = f.y
		}
		var v *sideView
		ok := false
		for attempt := 0; attempt < 2; attempt++ {
			y0 := f.y
			// the title goes under the view, wrapped to its width
			maxH := math.Min(f.area.H*0.48, f.area.Bottom()-f.y-3*lineHeight(sizeHeading)-lineHeight(sizeBody)-2)
			v, ok = sv.make(x, f.y, w, maxH, sx)
			if !ok && sx != 0 {
				// at a scale of its own rather than not at all
				v, ok = sv.make(x, f.y, w, maxH, 0)
			}
			if ok || (y0 == f.area.Y && x == f.area.X) {
				break
			}
			// not enough room left here: start the view on the next sheet
			if x == f.area.X {
				f.newPage()
			} else {
				f.y = rowBottom
			}
			x, w, rowTop = f.area.X, f.area.W, f.y
		}
		caption := "Not drawn: it fits no standard scale on this paper."
		tw := w
		if ok {
			tw = math.Max(v.frame.W, 60)
			view := View{Name: v.name, Frame: v.frame, Scale: v.sx, Shapes: v.shapes}
			if v.sy != v.sx {
				view.VScale = v.sy
			}
			f.page.Views = append(f.page.Views, view)
			f.page.Labels = append(f.page.Labels, v.labels...)
			f.page.Texts = append(f.page.Texts, v.texts...)
			caption = "Scale " + ScaleName(v.sx, sys)
			if v.sy != v.sx {
				caption = "Horizontal scale " + ScaleName(v.sx, sys) + ", vertical " + ScaleName(v.sy, sys) + exaggeration(v.sx, v.sy) + "."
			}
			f.y += v.frame.H
			sx = v.sx
			if b.model.ElevationScale == 0 {
				b.model.ElevationScale = v.sx
			}
		}
		f.y += 1
		for _, l := range b.m.wrap(clean(sv.title), tw, sizeHeading, true) {
			f.y += lineHeight(sizeHeading)
			f.page.Texts = append(f.page.Texts, Text{X: x, Y: f.y - 0.8, Size: sizeHeading, Bold: true, Text: l})
		}
		f.y += lineHeight(sizeBody)
		f.page.Texts = append(f.page.Texts, Text{X: x, Y: f.y - 0.8, Size: sizeBody, Bold: true, Text: clean(caption)})
		f.y += 4
		prevRight = x + tw
		rowBottom = math.Max(rowBottom, f.y)
		f.y = rowBottom
	}
}

// elevationTitle is the elevation's heading: heights above the floor (the
// ground on an outdoor pad), zones cut at the surfaces the cell has.
func (b *builder) elevationTitle() string {
	if b.ground() == "ground" {
		return "ELEVATION — vertical section through the jet axis: x downstream of the nozzle exit, heights above the ground; the zones are cut at the ground"
	}
	return "ELEVATION — vertical section through the jet axis: x downstream of the nozzle exit, heights above the floor; the zones are cut at the floor, the ceiling and the walls"
}
