package sheet

import (
	"math"
	"sort"
	"strings"
)

// flow places blocks (headings, tables, text columns, figures) down the
// sheets after sheet 1. It fills each sheet before starting the next: a
// table runs on row by row into the space left (a narrow one in lanes side
// by side, balanced on its last sheet), text runs in columns (balanced when
// it ends on the sheet), and a figure that does not fit where it comes
// floats to the top of the next sheet while the tables and text after it
// fill the space it left. Every sheet keeps the title block's band at its
// foot free.
type flow struct {
	b    *builder
	area Rect // content area of a sheet
	page *Page
	y    float64
	// pending are the figures waiting for the next sheet, in order
	pending []block
	// sink, when set, takes the pages instead of the model (a scratch flow
	// that lays figures out before they are placed)
	sink *[]Page
	// pages counts the sheets this flow started; short is the number of
	// the sheet (1 for the first) whose content ends at foot (y, mm) at
	// the lowest, to balance the last sheet
	pages, short int
	foot         float64
	// ends are the y where each sheet's content ended, mm
	ends []float64
}

// Flow spacing, mm.
const (
	laneGap  = 6.0 // between the lanes of a narrow table
	blockGap = 4.0 // under a figure
	// cutGap is the least vertical gap between two figures on a scratch
	// sheet: items closer than this belong to one figure
	cutGap = 2.5
)

func newFlow(b *builder) *flow {
	f := b.frame
	return &flow{b: b, area: Rect{f.X + 3, f.Y + 3, f.W - 6, f.H - 6 - titleH - gapMM}}
}

// scratch returns a flow of the same size that lays out on pages of its
// own.
func (f *flow) scratch() *flow {
	g := &flow{b: f.b, area: f.area, sink: new([]Page)}
	g.newPage()
	return g
}

// bottomFor returns the lowest y a block spanning x0 to x1 (mm) may reach:
// the frame's foot beside the title block, else the top of its band.
func (f *flow) bottomFor(x0, x1 float64) float64 {
	y := f.foot0(x0, x1)
	if f.pages == f.short {
		y = math.Min(y, f.foot)
	}
	return y
}

// foot0 is bottomFor on a sheet whose foot is not raised to balance the
// last sheet: figures are placed against it.
func (f *flow) foot0(x0, x1 float64) float64 {
	if x1 <= f.b.frame.Right()-f.b.colW-gapMM {
		return f.b.frame.Bottom() - 3
	}
	return f.area.Bottom()
}

// newPage starts a sheet and places on it the figures waiting, as many as
// fit (the first always).
func (f *flow) newPage() {
	if f.page != nil {
		f.ends = append(f.ends, f.y)
	}
	if f.sink != nil {
		*f.sink = append(*f.sink, Page{})
		f.page = &(*f.sink)[len(*f.sink)-1]
	} else {
		f.b.model.Pages = append(f.b.model.Pages, Page{})
		f.page = &f.b.model.Pages[len(f.b.model.Pages)-1]
	}
	f.y = f.area.Y
	f.pages++
	for len(f.pending) > 0 && (f.atTop() || f.fits(&f.pending[0])) {
		f.place(&f.pending[0])
		f.pending = f.pending[1:]
	}
}

// atTop reports whether nothing is placed on the current sheet yet.
func (f *flow) atTop() bool { return f.page != nil && f.y <= f.area.Y }

// room returns the height left on the current sheet, mm.
func (f *flow) room() float64 {
	if f.page == nil {
		return 0
	}
	return f.bottomFor(f.area.X, f.area.Right()) - f.y
}

// ensure starts new sheets until h mm are left on one, or one is empty.
func (f *flow) ensure(h float64) {
	for f.page == nil || (f.room() < h && !f.atTop()) {
		f.newPage()
	}
}

// heading prints a section heading, kept with at least keep mm of what
// follows.
func (f *flow) heading(s string, keep float64) {
	h := lineHeight(sizeHeading) + 1.5
	f.ensure(h + keep)
	f.y += capHeight(sizeHeading) + 0.5
	f.page.Texts = append(f.page.Texts, f.b.text(f.area.X, f.y, sizeHeading, true, s))
	f.y += h - capHeight(sizeHeading) - 0.5
}

// gap adds vertical space unless at the top of a sheet.
func (f *flow) gap(h float64) {
	if f.page != nil && f.y > f.area.Y {
		f.y += h
	}
}

// block is a figure that is never split: a side view with its caption, a
// row of details, the label key. It is laid out on a scratch sheet and
// moved to where the flow places it.
type block struct {
	y0, h  float64 // top on the scratch sheet and height, mm
	x0, x1 float64 // left and right, mm
	views  []View
	labels []Label
	texts  []Text
	shapes []Shape
	tables []Table
}

// fits reports whether bl fits in the space left on the current sheet.
func (f *flow) fits(bl *block) bool {
	return f.y+bl.h <= f.foot0(bl.x0, bl.x1)
}

// float places bl where the flow is when it fits there and no figure
// waits, else queues it for the next sheet.
func (f *flow) float(bl block) {
	if f.page != nil && len(f.pending) == 0 && f.fits(&bl) {
		f.place(&bl)
		return
	}
	f.pending = append(f.pending, bl)
}

// flush places the figures still waiting.
func (f *flow) flush() {
	for len(f.pending) > 0 {
		f.ensure(f.pending[0].h)
		if len(f.pending) > 0 && (f.atTop() || f.fits(&f.pending[0])) {
			f.place(&f.pending[0])
			f.pending = f.pending[1:]
		}
	}
}

// place puts a copy of bl on the current sheet at the flow's y (the
// figures are kept to be placed again when the flow is run again to
// balance the last sheet).
func (f *flow) place(bl *block) {
	dy := f.y - bl.y0
	pg := f.page
	for _, v := range bl.views {
		v.Frame.Y += dy
		v.Shapes = shifted(v.Shapes, dy)
		pg.Views = append(pg.Views, v)
	}
	for _, l := range bl.labels {
		l.Y += dy
		l.Anchor.Y += dy
		l.Line = shiftPts(l.Line, dy)
		pg.Labels = append(pg.Labels, l)
	}
	for _, t := range bl.texts {
		t.Y += dy
		pg.Texts = append(pg.Texts, t)
	}
	pg.Shapes = append(pg.Shapes, shifted(bl.shapes, dy)...)
	for _, t := range bl.tables {
		t.Y += dy
		pg.Tables = append(pg.Tables, t)
	}
	f.y += bl.h + blockGap
}

// shifted returns copies of shapes moved down by dy mm.
func shifted(shapes []Shape, dy float64) []Shape {
	out := make([]Shape, len(shapes))
	for i, s := range shapes {
		s.Points = shiftPts(s.Points, dy)
		s.Clip = shiftPts(s.Clip, dy)
		if s.Holes != nil {
			hs := make([][]Pt, len(s.Holes))
			for j, h := range s.Holes {
				hs[j] = shiftPts(h, dy)
			}
			s.Holes = hs
		}
		out[i] = s
	}
	return out
}

// shiftPts returns a copy of pts moved down by dy mm (nil for nil).
func shiftPts(pts []Pt, dy float64) []Pt {
	if pts == nil {
		return nil
	}
	out := make([]Pt, len(pts))
	for i, p := range pts {
		out[i] = Pt{p.X, p.Y + dy}
	}
	return out
}

// figures lays out with lay on scratch sheets and queues what it drew,
// cut into figures at the vertical gaps between them, in order. The
// figures are laid out once per sheet set and kept under name.
func (f *flow) figures(name string, lay func(g *flow)) {
	b := f.b
	bls, ok := b.figures[name]
	if !ok {
		g := f.scratch()
		lay(g)
		for i := range *g.sink {
			bls = append(bls, cut(&(*g.sink)[i])...)
		}
		if b.figures == nil {
			b.figures = make(map[string][]block)
		}
		b.figures[name] = bls
	}
	for _, bl := range bls {
		f.float(bl)
	}
}

// cut splits a scratch sheet into figures: items whose extents overlap,
// or lie less than cutGap apart, go together.
func cut(pg *Page) []block {
	type ext struct {
		y0, y1, x0, x1 float64
		kind, i        int
	}
	var es []ext
	add := func(r Rect, kind, i int) {
		es = append(es, ext{r.Y, r.Bottom(), r.X, r.Right(), kind, i})
	}
	for i, v := range pg.Views {
		add(v.Frame, 0, i)
	}
	for i, l := range pg.Labels {
		add(l.Box(), 1, i)
	}
	for i, t := range pg.Texts {
		lh := lineHeight(t.Size)
		add(Rect{t.X, t.Y - 0.8*lh, 0, lh}, 2, i)
	}
	for i, s := range pg.Shapes {
		add(shapeBound(s), 3, i)
	}
	for i := range pg.Tables {
		t := &pg.Tables[i]
		add(Rect{t.X, t.Y, t.W(), t.H()}, 4, i)
	}
	sort.SliceStable(es, func(i, j int) bool { return es[i].y0 < es[j].y0 })
	var out []block
	var cur *block
	for _, e := range es {
		if cur == nil || e.y0 >= cur.y0+cur.h+cutGap {
			out = append(out, block{y0: e.y0, x0: e.x0, x1: e.x1})
			cur = &out[len(out)-1]
		}
		cur.h = math.Max(cur.h, e.y1-cur.y0)
		cur.x0, cur.x1 = math.Min(cur.x0, e.x0), math.Max(cur.x1, e.x1)
		switch e.kind {
		case 0:
			cur.views = append(cur.views, pg.Views[e.i])
		case 1:
			cur.labels = append(cur.labels, pg.Labels[e.i])
		case 2:
			cur.texts = append(cur.texts, pg.Texts[e.i])
		case 3:
			cur.shapes = append(cur.shapes, pg.Shapes[e.i])
		default:
			cur.tables = append(cur.tables, pg.Tables[e.i])
		}
	}
	return out
}

// textLine is one paragraph of a text block.
type textLine struct {
	text   string
	bold   bool
	indent float64 // mm
	space  float64 // extra space before, mm
	whole  bool    // never split across columns or sheets
}

// columns prints the heading head (when given) and flows paragraphs
// through columns about 125 mm wide across the sheet, column by column,
// then on to the next sheet, where it repeats the heading marked
// continued. A bold line is kept with the line
// after it, a whole paragraph with itself. Text that ends on a sheet is
// balanced over the columns it needs.
func (f *flow) columns(head string, paras []textLine) {
	b := f.b
	k := max(1, int((f.area.W+6)/126))
	const cgap = 6.0
	cw := (f.area.W - float64(k-1)*cgap) / float64(k)
	sz := sizeBody
	lh := lineHeight(sz)
	type wl struct {
		text  string
		bold  bool
		x     float64
		space float64
		need  float64 // height kept together from this line on, mm
	}
	var lines []wl
	for _, p := range paras {
		ws := b.m.wrap(clean(p.text), cw-p.indent, sz, p.bold)
		for i, w := range ws {
			l := wl{text: w, bold: p.bold, x: p.indent, need: lh}
			if i == 0 {
				l.space = p.space
				if p.whole {
					l.need = float64(len(ws)) * lh
				}
			}
			if p.bold && i == len(ws)-1 {
				l.need += lh
			}
			lines = append(lines, l)
		}
	}
	colX := func(c int) float64 { return f.area.X + float64(c)*(cw+cgap) }
	// fill places lines from the top of the space left, column by column,
	// each column down to limit mm at most; it returns how many lines
	// fit, their baselines and columns, and the lowest bottom
	fill := func(ls []wl, top, limit float64, force bool) (int, []float64, []int, float64) {
		var ys []float64
		var cs []int
		c, y, bottom := 0, top, top
		for i, l := range ls {
			for {
				colBottom := math.Min(f.bottomFor(colX(c), colX(c)+cw), top+limit)
				sp := 0.0
				if y > top {
					sp = l.space
				}
				if y+sp+l.need <= colBottom || (y == top && force && c == 0 && i == 0) {
					y += sp + lh
					break
				}
				if y == top && c == k-1 {
					return i, ys, cs, bottom
				}
				c++
				if c == k {
					return i, ys, cs, bottom
				}
				y = top
			}
			ys = append(ys, y)
			cs = append(cs, c)
			bottom = math.Max(bottom, y)
		}
		return len(ls), ys, cs, bottom
	}
	if len(lines) == 0 {
		return
	}
	keep := math.Max(lines[0].need, math.Min(4*lh, float64(len(lines))*lh))
	if head != "" {
		f.heading(head, keep)
	} else {
		f.ensure(keep)
	}
	for len(lines) > 0 {
		top := f.y
		full := f.area.Bottom() + 60 - top // no limit beside the title block
		n, ys, cs, bottom := fill(lines, top, full, f.atTop())
		if n == len(lines) {
			// ends here: balance over the columns, at the least height
			// that still holds it all
			lo, hi := lh, full
			for hi-lo > 0.2 {
				mid := (lo + hi) / 2
				if m, _, _, _ := fill(lines, top, mid, false); m == len(lines) {
					hi = mid
				} else {
					lo = mid
				}
			}
			if m, ys2, cs2, bottom2 := fill(lines, top, hi, false); m == len(lines) {
				ys, cs, bottom = ys2, cs2, bottom2
			}
		}
		for i := 0; i < n; i++ {
			l := lines[i]
			f.page.Texts = append(f.page.Texts, Text{X: colX(cs[i]) + l.x, Y: ys[i] - lh*0.25, Size: sz, Bold: l.bold, Text: l.text})
		}
		f.y = bottom + 1
		lines = lines[n:]
		if len(lines) > 0 {
			f.newPage()
			if head != "" {
				f.heading(shortTitle(head)+" (continued)", math.Max(lines[0].need, 4*lh))
			}
		}
	}
}

// shortTitle returns a title up to its first dash or bracket: the name a
// part that continues it goes by ("SET-OUT TABLE").
func shortTitle(s string) string {
	for _, sep := range []string{" —", " (", ";"} {
		if i := strings.Index(s, sep); i > 0 {
			s = s[:i]
		}
	}
	return s
}
