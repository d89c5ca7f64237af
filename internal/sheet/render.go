package sheet

import (
	"fmt"
	"io"
	"slices"
	"strings"

	"github.com/jung-kurt/gofpdf"
)

// Render writes the model as PDF to w. The bytes depend only on the model:
// the creation and modification dates are the model's Created time and the
// catalog is sorted, so the same model gives the same file.
//
// It returns an error wrapping [ErrRender] when the PDF writer fails.
func (m *Model) Render(w io.Writer) error {
	pdf := gofpdf.NewCustom(&gofpdf.InitType{
		OrientationStr: "L", UnitStr: "mm",
		// gofpdf takes the portrait size and turns it for "L"
		Size: gofpdf.SizeType{Wd: m.Paper.Height, Ht: m.Paper.Width},
	})
	pdf.SetCompression(true)
	pdf.SetCatalogSort(true)
	pdf.SetCreationDate(m.Created)
	pdf.SetModificationDate(m.Created)
	pdf.SetProducer("arcwright", false)
	pdf.SetCreator("arcwright floor layout sheet", false)
	pdf.SetTitle(m.Title, true)
	pdf.SetAutoPageBreak(false, 0)
	pdf.SetMargins(0, 0, 0)
	r := &renderer{pdf: pdf, tr: pdf.UnicodeTranslatorFromDescriptor("")}
	for i := range m.Pages {
		r.page(&m.Pages[i])
	}
	if err := pdf.Output(w); err != nil {
		return fmt.Errorf("%w: %w", ErrRender, err)
	}
	return nil
}

// renderer draws a model's pages with gofpdf.
type renderer struct {
	pdf *gofpdf.Fpdf
	tr  func(string) string
	// the pen and fill last set, to skip setting them again; nil after a
	// new page or the end of a clip, which reset the PDF's state
	pen  *Pen
	fill *RGB
}

// reset forgets the pen and fill set, after the PDF's graphics state was
// restored.
func (r *renderer) reset() { r.pen, r.fill = nil, nil }

func (r *renderer) page(pg *Page) {
	pdf := r.pdf
	pdf.AddPage()
	r.reset()
	for _, v := range pg.Views {
		pdf.ClipRect(v.Frame.X, v.Frame.Y, v.Frame.W, v.Frame.H, false)
		for _, s := range v.Shapes {
			r.shape(s)
		}
		pdf.ClipEnd()
		r.reset()
		r.shape(rectShape(StyleBox, v.Frame))
	}
	for _, s := range pg.Shapes {
		r.shape(s)
	}
	for _, l := range pg.Labels {
		if len(l.Line) == 2 {
			r.shape(line(StyleLeader, l.Line[0], l.Line[1]))
		}
	}
	for _, l := range pg.Labels {
		r.shape(rectShape(StyleWhite, l.Box()))
		r.text(Text{X: l.X + 0.4, Y: l.Y + 0.5 + capHeight(l.Size), Size: l.Size, Text: l.Text, Bold: l.Kind == NumberLabel})
	}
	for i := range pg.Tables {
		r.table(&pg.Tables[i])
	}
	for _, t := range pg.Texts {
		r.text(t)
	}
}

// setPen sets the stroke of p.
func (r *renderer) setPen(p Pen) {
	if c := r.pen; c != nil && c.Width == p.Width && c.Color == p.Color && c.Round == p.Round && slices.Equal(c.Dash, p.Dash) {
		return
	}
	r.pen = &p
	r.pdf.SetLineWidth(p.Width)
	r.pdf.SetDrawColor(p.Color[0], p.Color[1], p.Color[2])
	if p.Round {
		r.pdf.SetLineCapStyle("round")
	} else {
		r.pdf.SetLineCapStyle("butt")
	}
	dash := p.Dash
	if dash == nil {
		dash = []float64{}
	}
	r.pdf.SetDashPattern(dash, 0)
}

// path traces the rings of a shape as one path.
func (r *renderer) path(rings [][]Pt, closed bool) {
	for _, ring := range rings {
		if len(ring) == 0 {
			continue
		}
		r.pdf.MoveTo(ring[0].X, ring[0].Y)
		for _, p := range ring[1:] {
			r.pdf.LineTo(p.X, p.Y)
		}
		if closed {
			r.pdf.ClosePath()
		}
	}
}

// shape draws s in its style: fill, then hatching, then outline.
func (r *renderer) shape(s Shape) {
	d, ok := styles[s.Style]
	if !ok || len(s.Points) == 0 {
		return
	}
	pdf := r.pdf
	if len(s.Clip) >= 3 {
		pts := make([]gofpdf.PointType, len(s.Clip))
		for i, p := range s.Clip {
			pts[i] = gofpdf.PointType{X: p.X, Y: p.Y}
		}
		pdf.ClipPolygon(pts, false)
		defer func() {
			pdf.ClipEnd()
			r.reset()
		}()
	}
	if d.Fill != nil && (r.fill == nil || *r.fill != *d.Fill) {
		pdf.SetFillColor(d.Fill[0], d.Fill[1], d.Fill[2])
		r.fill = d.Fill
	}
	switch s.Kind {
	case Circle:
		c := s.Points[0]
		switch {
		case d.Fill != nil && d.Pen.Width > 0:
			r.setPen(d.Pen)
			pdf.Circle(c.X, c.Y, s.R, "FD")
		case d.Fill != nil:
			pdf.Circle(c.X, c.Y, s.R, "F")
		case d.Pen.Width > 0:
			r.setPen(d.Pen)
			pdf.Circle(c.X, c.Y, s.R, "D")
		}
	case Polyline:
		if d.Pen.Width > 0 && len(s.Points) > 1 {
			r.setPen(d.Pen)
			r.path([][]Pt{s.Points}, false)
			pdf.DrawPath("S")
		}
	case Polygon:
		rings := append([][]Pt{s.Points}, s.Holes...)
		if d.Fill != nil {
			r.path(rings, true)
			pdf.DrawPath("f*")
		}
		for _, h := range d.Hatches {
			r.setPen(h.Pen)
			for _, seg := range hatchSegments(rings, h.Angle, h.Spacing) {
				pdf.Line(seg[0].X, seg[0].Y, seg[1].X, seg[1].Y)
			}
		}
		if d.Pen.Width > 0 {
			r.setPen(d.Pen)
			r.path(rings, true)
			pdf.DrawPath("S")
		}
	}
}

// font selects the core font at size (pt).
func (r *renderer) font(size float64, bold bool) {
	style := ""
	if bold {
		style = "B"
	}
	r.pdf.SetFont(fontFamily, style, size)
}

// text prints t.
func (r *renderer) text(t Text) {
	r.font(t.Size, t.Bold)
	switch t.Color {
	case Grey:
		r.pdf.SetTextColor(90, 90, 90)
	case Red:
		r.pdf.SetTextColor(hotRed[0], hotRed[1], hotRed[2])
	default:
		r.pdf.SetTextColor(0, 0, 0)
	}
	r.pdf.Text(t.X, t.Y, r.tr(t.Text))
}

// table draws one part of a table: title, shaded heading, rows with
// alternate shading, and the rules.
func (r *renderer) table(t *Table) {
	for i, l := range strings.Split(t.Title, "\n") {
		if l == "" {
			continue // a lane beside the first part has no title
		}
		r.text(Text{X: t.X, Y: t.Y + capHeight(sizeBody) + 0.3 + float64(i)*lineHeight(sizeBody), Size: sizeBody, Bold: true, Text: l})
	}
	w := t.W()
	y0 := t.Y + t.TitleH
	r.shape(rectShape(StyleHeadFill, Rect{t.X, y0, w, t.HeadH}))
	y := y0 + t.HeadH
	for i, row := range t.Rows {
		if i%2 == 1 {
			r.pdf.SetFillColor(247, 247, 247)
			r.fill = nil
			r.pdf.Rect(t.X, y, w, row.H, "F")
		}
		y += row.H
	}
	x := t.X
	for _, c := range t.Columns {
		for j, l := range c.Heading {
			r.cellText(l, x, c.W, y0+cellPadY+float64(j)*t.Line, t, true, c.Right)
		}
		x += c.W
	}
	y = y0 + t.HeadH
	for _, row := range t.Rows {
		x := t.X
		for ci, c := range t.Columns {
			if ci < len(row.Cells) {
				for j, l := range row.Cells[ci] {
					r.cellText(l, x, c.W, y+cellPadY+float64(j)*t.Line, t, false, c.Right)
				}
			}
			x += c.W
		}
		y += row.H
		r.shape(line(StyleRule, Pt{t.X, y}, Pt{t.X + w, y}))
	}
	x = t.X
	for _, c := range t.Columns[:len(t.Columns)-1] {
		x += c.W
		r.shape(line(StyleRule, Pt{x, y0}, Pt{x, y}))
	}
	r.shape(rectShape(StyleBox, Rect{t.X, y0, w, y - y0}))
	r.shape(line(StyleBox, Pt{t.X, y0 + t.HeadH}, Pt{t.X + w, y0 + t.HeadH}))
}

// cellText prints one line of a cell whose line box starts at y.
func (r *renderer) cellText(s string, x, w, y float64, t *Table, bold, right bool) {
	r.font(t.Size, bold)
	tx := x + cellPadX
	if right {
		tx = x + w - cellPadX - r.pdf.GetStringWidth(r.tr(s))
	}
	r.pdf.SetTextColor(0, 0, 0)
	r.pdf.Text(tx, y+t.Line*0.78, r.tr(s))
}
