package sheet

import (
	"fmt"
	"math"
	"strings"
)

// scaleStrip draws the scale bar and the plan's caption under the plan view.
func (b *builder) scaleStrip(pg *Page, vf Rect) {
	bar := scaleBarFor(b.model.Scale, b.req.Units, math.Min(100, vf.W*0.33))
	bar.X, bar.Y = vf.X+3, vf.Bottom()+3.5
	const h = 1.8
	seg := bar.LengthMM / float64(bar.Divisions)
	for i := 0; i < bar.Divisions; i++ {
		r := Rect{bar.X + float64(i)*seg, bar.Y, seg, h}
		s := StyleBox
		if i%2 == 0 {
			s = StyleScaleFill
		}
		pg.Shapes = append(pg.Shapes, rectShape(s, r))
	}
	sz := sizeSmall
	for i, t := range bar.Ticks {
		x := bar.X + float64(i)*seg
		if i == len(bar.Ticks)-1 {
			t += " " + unitSym(b.req.Units)
		}
		w := b.m.width(t, sz, false)
		if i == len(bar.Ticks)-1 {
			w = b.m.width(bar.Ticks[i], sz, false)
		}
		pg.Texts = append(pg.Texts, b.text(x-w/2, bar.Y+h+capHeight(sz)+1, sz, false, t))
	}
	b.model.ScaleBar = bar
	x := bar.X + bar.LengthMM + 12
	pg.Texts = append(pg.Texts, b.text(x, bar.Y+2.2, 7, true, fmt.Sprintf("PLAN   Scale %s on %s — do not scale a print at another size", ScaleName(b.model.Scale, b.req.Units), b.model.Paper.Name)))
	caption := fmt.Sprintf("Scale bar %s. Grid %s from the datum. %s", bar.Label, trimNum(b.gridStep/unitLen(b.req.Units))+" "+unitSym(b.req.Units), b.drawnWhat())
	for i, l := range b.m.wrap(clean(caption), vf.Right()-x, sizeSmall, false) {
		pg.Texts = append(pg.Texts, Text{X: x, Y: bar.Y + 5.6 + float64(i)*lineHeight(sizeSmall), Size: sizeSmall, Text: l})
	}
}

// minSafetySize is the smallest type of the safety panel and of the
// safety warnings on sheet 1, pt: a 6-pt body is 2.1 mm high (1 pt =
// 0.3528 mm), about the 2 mm that common practice takes as the least text
// height legible on a print (FROM MEMORY: ISO 3098-0's smallest nominal
// height is 1.8 mm). They are set in sizeBody and shrink to it only when
// sheet 1 is short of room.
const minSafetySize = 6.0

// safetySizes are the type sizes tried for the safety content, pt.
var safetySizes = []float64{sizeBody, 6.25, minSafetySize}

// laterMark stands for the number of a later sheet in a pointer on sheet 1
// until the flow has placed what it points to.
const laterMark = "sheet_?"

// Headings on the later sheets that sheet 1 points to.
const (
	notesHeading    = "NOTES ON THE PLAN (from sheet 1)"
	legendHeading   = "LEGEND OF THE PLAN (sheet 1)"
	warningsHeading = "PLANNER WARNINGS IN FULL (sheet 1 groups the safety warnings by kind)"
)

// columnPlan is how the column of sheet 1 holds its panels.
type columnPlan struct {
	size    float64    // type size of the safety content, pt
	shown   []warnLine // the warning lines on sheet 1
	pointer []string   // lines pointing to later sheets
	notes   bool       // the notes are on sheet 1
	legend  bool       // the legend is on sheet 1
}

// planColumn chooses, for a column of width w and height h (mm), the
// largest type for the safety content and what else goes on sheet 1:
// the safety panel and every safety warning always; then the legend (in
// type down to minSafetySize before it moves), the notes and the other
// warnings (which move before the type shrinks), when there is room; what
// does not fit moves to a later sheet with a pointer. ok is false when the
// safety content does not fit even in minSafetySize.
func (b *builder) planColumn(w, h float64, lines []warnLine, notes []string) (columnPlan, bool) {
	var safe, all []warnLine
	verbatim := true
	for _, l := range lines {
		all = append(all, l)
		if l.safety {
			safe = append(safe, l)
			verbatim = verbatim && len(l.of) == 1 && l.text == b.plan.Warnings[l.of[0]]
		}
	}
	scratch := Rect{0, 0, w, 0}
	legendH := b.legend(&Page{}, scratch)
	notesH := b.notesPanel(&Page{}, scratch, notes)
	defer func(s float64) { b.safetySize = s }(b.safetySize)
	// the legend stays on sheet 1 in smaller type rather than move; the
	// notes and the other warnings move before the type shrinks
	for _, legend := range []bool{true, false} {
		for _, s := range safetySizes {
			b.safetySize = s
			cautH := b.cautions(&Page{}, scratch)
			for _, o := range []struct{ others, notes bool }{{true, true}, {false, true}, {true, false}, {false, false}} {
				cp := columnPlan{size: s, notes: o.notes, legend: legend, shown: safe}
				if o.others {
					cp.shown = all
				}
				if !legend {
					cp.pointer = append(cp.pointer, "Legend of the plan: "+laterMark+".")
				}
				if !o.notes {
					cp.pointer = append(cp.pointer, "Notes on the plan: "+laterMark+".")
				}
				if n := len(all) - len(safe); !o.others && n > 0 {
					cp.pointer = append(cp.pointer, fmt.Sprintf("%s (not about safety), and every warning in full: %s.", plural(n, "other warning"), laterMark))
				} else if !verbatim {
					cp.pointer = append(cp.pointer, "Every warning in full: "+laterMark+".")
				}
				need := cautH
				if legend {
					need += gapMM + legendH
				}
				if len(cp.shown)+len(cp.pointer) > 0 {
					need += gapMM + b.warningsPanel(&Page{}, scratch, cp.shown, cp.pointer)
				}
				if o.notes {
					need += gapMM + notesH
				}
				if need <= h {
					return cp, true
				}
			}
		}
	}
	return columnPlan{}, false
}

// columnRect returns the right-hand column of sheet 1 above the title
// block.
func (b *builder) columnRect() Rect {
	return Rect{b.frame.Right() - b.colW, b.frame.Y, b.colW, b.frame.H - titleH - gapMM}
}

// column lays out the right-hand column of sheet 1: the safety panel, the
// warnings (every safety warning, in type no smaller than minSafetySize),
// the legend, the notes and, when it fits, the label key. It returns an
// error wrapping ErrPaperRoom when the safety content does not fit,
// naming the papers where it does.
func (b *builder) column(pg *Page, notes []string) error {
	col := b.columnRect()
	x, w := col.X+1.5, col.W-3
	lines := b.warningLines()
	notes = b.notesList(notes)
	cp, ok := b.planColumn(w, col.H-1.5, lines, notes)
	if !ok {
		return b.noRoom(lines, notes)
	}
	b.safetySize = cp.size
	panel := func(name string, y0, y1 float64) {
		pg.Panels = append(pg.Panels, Panel{Name: name, Box: Rect{x, y0, w, y1 - y0}})
	}
	y := col.Y + 1.5
	y0 := y
	y = b.cautions(pg, Rect{x, y, w, 0})
	panel("safety", y0, y)
	y += gapMM
	if len(cp.shown)+len(cp.pointer) > 0 {
		y0 = y
		y = b.warningsPanel(pg, Rect{x, y, w, 0}, cp.shown, cp.pointer)
		panel("warnings", y0, y)
		y += gapMM
		for _, l := range cp.shown {
			if len(l.of) == 1 && l.text == b.plan.Warnings[l.of[0]] {
				b.warningsShown[l.of[0]] = true
			}
		}
		b.model.Warnings = nil
		for _, l := range cp.shown {
			b.model.Warnings = append(b.model.Warnings, WarningLine{Text: clean(l.text), Warnings: l.of, Safety: l.safety, Size: cp.size})
		}
	}
	if cp.legend {
		y0 = y
		y = b.legend(pg, Rect{x, y, w, 0})
		panel("legend", y0, y)
		y += gapMM
	} else {
		b.legendLater = true
	}
	if cp.notes {
		y0 = y
		y = b.notesPanel(pg, Rect{x, y, w, 0}, notes)
		panel("notes", y0, y)
		y += gapMM
	} else {
		b.notesLater = notes
	}
	if len(b.model.Key) > 0 {
		if h := b.keyHeight(w); y+h <= col.Bottom() {
			b.keyPanel(pg, Rect{x, y, w, h})
			panel("key", y, y+h)
			b.keyPlaced = true
		}
	}
	return nil
}

// noRoom returns the error of a paper whose sheet 1 has no room for the
// safety content, naming the papers that have.
func (b *builder) noRoom(lines []warnLine, notes []string) error {
	n := 0
	for _, l := range lines {
		if l.safety {
			n += len(l.of)
		}
	}
	var fit []string
	for _, p := range papers {
		if p.Name == b.model.Paper.Name {
			continue
		}
		fw, fh := p.Width-marginLeft-marginOther, p.Height-2*marginOther
		if _, ok := b.planColumn(columnWidth(fw)-3, fh-titleH-gapMM-1.5, lines, notes); ok {
			fit = append(fit, p.Name)
		}
	}
	way := "no paper offered has room for them"
	_ = notes
	if len(fit) > 0 {
		way = "use a paper that has room: " + joinOr(fit)
	}
	return fmt.Errorf("%w: sheet 1 of %s has no room beside the plan for the safety panel and all %s, even in %g-pt type (the smallest kept legible); a sheet 1 that leaves out a safety warning is not issued: %s",
		ErrPaperRoom, b.model.Paper.Name, plural(n, "safety warning"), minSafetySize, way)
}

// hazardStatement is the safety panel's first line: the hazard and its
// consequence, which set the panel's level.
const hazardStatement = "HOT, HIGH-VELOCITY JET EXHAUST: can kill or seriously injure. Loud enough to damage hearing."

// signalWord is the signal word of the safety panel. Hot high-velocity
// exhaust could result in death or serious injury if the hazard is not
// avoided: the WARNING level of ANSI Z535.4-2007 §4.14.2, with the safety
// orange panel and the safety alert symbol (READ in a label maker's summary
// of ANSI Z535.4 and ISO 3864-2; not DANGER, which the standard keeps for
// hazards that will, not could, result in death).
const signalWord = "WARNING"

// cautionItems are the safety panel's instructions on sheet 1.
func (b *builder) cautionItems() []string {
	pr := b.pr
	return []string{
		"HOT-EXHAUST AND HIGH-VELOCITY ZONES (hatched): no person, stand or cable inside them, or inside their margins (dotted), while the jet runs.",
		fmt.Sprintf("The zones are predictions of the MEAN flow: turbulent gusts are well above the mean. Drawn: velocity zone where the mean velocity exceeds %s, hot zone where the total temperature exceeds %s, each with a margin of %s. The envelopes use the conservative end of the published scatter.",
			pr.speed(b.lim.Velocity), pr.temp(b.lim.Temperature), pr.length(b.lim.Margin)),
		"Every station was checked against every operating point; the zones drawn are named under the plan.",
		"Bent (rising) and wall-jet zones are drawn and checked too; their scatter is wider than the free jet's: keep well clear of every surface the exhaust strikes.",
		"NOISE: wear hearing protection in and near the cell. Keep out of the cell during runs. The predicted levels and contours are estimates (about ±3 dB at best).",
		"Before every run: clearances re-measured, nothing loose in the zones, cables secured outside the zones, people out of the cell, headcount done.",
		"Nozzle, ducting and plume-side hardware stay hot after shutdown.",
		"Follow the facility's safety procedures, local codes and licensed practice; they take precedence over this sheet.",
	}
}

// hotName names the hot zone drawn, with its operating point when that is
// not the governing one.
func (b *builder) hotName() string {
	if b.zs.hotPoint != b.gov.Name {
		return "hot zone of point " + b.zs.hotPoint
	}
	return "hot zone"
}

// drawnWhat says which operating points the drawn zones belong to.
func (b *builder) drawnWhat() string {
	s := fmt.Sprintf("The zones drawn are those of operating point %s, the one with the largest velocity zone", b.gov.Name)
	switch {
	case b.zs.hot == nil:
		return s + "; no operating point has a hot zone."
	case b.zs.hotPoint != b.gov.Name:
		return s + fmt.Sprintf(", and the hot zone of point %s, the largest hot zone.", b.zs.hotPoint)
	}
	return s + "."
}

// cautions draws the safety panel at r (its height grows to fit) and
// returns the y of its bottom: a signal-word band in safety orange with the
// safety alert symbol and the word WARNING in black (ANSI Z535.4 and
// ISO 3864-2 panel colours; black on orange stays legible in grey print),
// the hazard statement, and the instructions.
func (b *builder) cautions(pg *Page, r Rect) float64 {
	const pad = 2.5
	const bandH = 7.5
	sz := b.safetySize
	if sz == 0 {
		sz = sizeBody
	}
	lh := lineHeight(sz)
	pg.Shapes = append(pg.Shapes, rectShape(StyleSignal, Rect{r.X, r.Y, r.W, bandH}))
	// the safety alert symbol: a black triangle with an exclamation mark in
	// the panel's colour
	base := r.Y + bandH - 1.2
	tx := r.X + pad
	tri := []Pt{{tx + 2.8, base - 5}, {tx + 5.6, base}, {tx, base}}
	pg.Shapes = append(pg.Shapes, poly(StyleSolid, tri),
		poly(StyleSignalMark, []Pt{{tx + 2.45, base - 3.5}, {tx + 3.15, base - 3.5}, {tx + 2.95, base - 1.6}, {tx + 2.65, base - 1.6}}),
		circle(StyleSignalMark, Pt{tx + 2.8, base - 0.8}, 0.38))
	pg.Texts = append(pg.Texts, Text{X: tx + 7.5, Y: base, Size: sizeCaution, Bold: true, Text: signalWord})
	y := r.Y + bandH + 0.8
	indent := b.m.width("• ", sz, false)
	for _, l := range b.m.wrap(clean(hazardStatement), r.W-2*pad, sz+0.5, true) {
		y += lineHeight(sz + 0.5)
		pg.Texts = append(pg.Texts, Text{X: r.X + pad, Y: y, Size: sz + 0.5, Bold: true, Text: l})
	}
	y += 0.8
	for i, it := range b.cautionItems() {
		bold := i == 0 || i == 3
		lines := b.m.wrap(clean(it), r.W-2*pad-indent, sz, bold)
		for j, l := range lines {
			y += lh
			if j == 0 {
				pg.Texts = append(pg.Texts, b.text(r.X+pad, y, sz, bold, "•"))
			}
			pg.Texts = append(pg.Texts, Text{X: r.X + pad + indent, Y: y, Size: sz, Bold: bold, Text: l})
		}
		y += 0.6
	}
	bottom := y + pad - 0.5
	pg.Shapes = append(pg.Shapes, rectShape(StyleCaution, Rect{r.X, r.Y, r.W, bottom - r.Y}))
	return bottom
}

// warningsPanel prints the warning lines ls at r (its height grows to
// fit) in the safety content's type, then the pointers to later sheets in
// bold, and returns the y of its bottom.
func (b *builder) warningsPanel(pg *Page, r Rect, ls []warnLine, pointer []string) float64 {
	const pad = 2.0
	sz := b.safetySize
	if sz == 0 {
		sz = sizeBody
	}
	lh := lineHeight(sz)
	y := r.Y + pad + capHeight(sizeHeading)
	head := "WARNINGS FROM THE PLAN"
	if len(b.hazardsDrawn) > 0 {
		head += " (a triangle on the plan marks where)"
	}
	for i, l := range b.m.wrap(clean(head), r.W-2*pad, sizeHeading, true) {
		if i > 0 {
			y += lineHeight(sizeHeading)
		}
		pg.Texts = append(pg.Texts, b.text(r.X+pad, y, sizeHeading, true, l))
	}
	y += 0.8
	indent := b.m.width("• ", sz, false)
	for _, w := range ls {
		for j, l := range b.m.wrap(clean(w.text), r.W-2*pad-indent, sz, false) {
			y += lh
			if j == 0 {
				pg.Texts = append(pg.Texts, b.text(r.X+pad, y, sz, false, "•"))
			}
			pg.Texts = append(pg.Texts, Text{X: r.X + pad + indent, Y: y, Size: sz, Text: l})
		}
		y += 0.4
	}
	for _, p := range pointer {
		for _, l := range b.m.wrap(clean(p), r.W-2*pad, sz, true) {
			y += lh
			pg.Texts = append(pg.Texts, Text{X: r.X + pad, Y: y, Size: sz, Bold: true, Text: l})
		}
	}
	bottom := y + pad
	pg.Shapes = append(pg.Shapes, rectShape(StyleCaution, Rect{r.X, r.Y, r.W, bottom - r.Y}))
	return bottom
}

// notesList returns the notes on the plan: the station count, extra (the
// plan view's notes) and the notes on labels and sheets.
func (b *builder) notesList(extra []string) []string {
	p := b.plan
	notes := []string{
		fmt.Sprintf("Stations: %d ok, %d with a warning, %d blocked (of %d).", p.OK, p.Warn, p.Blocked, len(p.Stations)),
	}
	notes = append(notes, extra...)
	if len(b.model.Key) > 0 {
		notes = append(notes, fmt.Sprintf("%s had no room for their IDs and are numbered: see the label key.", plural(len(b.model.Key), "station")))
	}
	if b.ranges != "" {
		notes = append(notes, "A label such as "+b.ranges+" names a run of neighbouring stations too close to label one by one: count the marks along the array from its first station.")
	}
	if n := len(b.model.Unlabelled); n > 0 {
		notes = append(notes, fmt.Sprintf("Not labelled for lack of room (%s): %s. Their positions are in the station table.",
			plural(n, "station"), idList(b.model.Unlabelled)))
	}
	return append(notes, "Set-out table and set-up steps: sheet 2; then the elevation, details and tables.")
}

// notesPanel prints the notes at r and returns the y of its bottom.
func (b *builder) notesPanel(pg *Page, r Rect, notes []string) float64 {
	const pad = 2.0
	sz := sizeSmall
	lh := lineHeight(sz)
	y := r.Y + pad + capHeight(sizeHeading)
	pg.Texts = append(pg.Texts, b.text(r.X+pad, y, sizeHeading, true, "NOTES"))
	y += 0.8
	for _, n := range notes {
		for _, l := range b.m.wrap(clean(n), r.W-2*pad, sz, false) {
			y += lh
			pg.Texts = append(pg.Texts, Text{X: r.X + pad, Y: y, Size: sz, Text: l})
		}
		y += 0.4
	}
	bottom := y + pad
	pg.Shapes = append(pg.Shapes, rectShape(StyleBox, Rect{r.X, r.Y, r.W, bottom - r.Y}))
	return bottom
}

// idList prints a list of IDs, shortened after 40.
func idList(ids []string) string {
	if len(ids) <= 40 {
		return strings.Join(ids, ", ")
	}
	return strings.Join(ids[:40], ", ") + fmt.Sprintf(" and %d more", len(ids)-40)
}

// keyLayout returns the entry width and the number of entry columns of the
// label key in width w.
func (b *builder) keyLayout(w float64) (float64, int) {
	ew := 0.0
	for _, k := range b.model.Key {
		ew = math.Max(ew, b.m.width(fmt.Sprintf("%d", k.Number), sizeSmall, true)+b.m.width(k.ID, sizeSmall, false))
	}
	ew += 5
	return ew, max(1, int((w-4)/ew))
}

// keyHeight returns the height of the key panel in width w, mm.
func (b *builder) keyHeight(w float64) float64 {
	_, cols := b.keyLayout(w)
	rows := (len(b.model.Key) + cols - 1) / cols
	return 4 + capHeight(sizeHeading) + 1 + float64(rows)*lineHeight(sizeSmall) + 1.5
}

// keyPanel prints the label key (number → station ID) in r.
func (b *builder) keyPanel(pg *Page, r Rect) {
	ew, cols := b.keyLayout(r.W)
	rows := (len(b.model.Key) + cols - 1) / cols
	y := r.Y + 2 + capHeight(sizeHeading)
	pg.Texts = append(pg.Texts, b.text(r.X+2, y, sizeHeading, true, "LABEL KEY (number on the plan: station ID)"))
	y += 1
	lh := lineHeight(sizeSmall)
	for i, k := range b.model.Key {
		c, row := i/rows, i%rows
		x := r.X + 2 + float64(c)*ew
		yy := y + float64(row+1)*lh
		n := fmt.Sprintf("%d", k.Number)
		pg.Texts = append(pg.Texts, Text{X: x, Y: yy, Size: sizeSmall, Bold: true, Text: n},
			Text{X: x + b.m.width(n, sizeSmall, true) + 1.2, Y: yy, Size: sizeSmall, Text: clean(k.ID)})
	}
	pg.Shapes = append(pg.Shapes, rectShape(StyleBox, r))
}
