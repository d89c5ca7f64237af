package export

import "arcwright/internal/planner"

// levelDoc is a station's predicted level for one operating point.
type levelDoc struct {
	Point     string `json:"point"`
	OASPL     num    `json:"oaspl_db"`
	AWeighted num    `json:"a_weighted_db"`
	Peak      num    `json:"peak_db"`
}

// crewDoc is a crew position's exposure for one operating point.
type crewDoc struct {
	Name         string `json:"name"`
	Point        string `json:"point"`
	AWeighted    num    `json:"a_weighted_db"`
	Peak         num    `json:"peak_db"`
	AllowedHours num    `json:"allowed_hours"`
	Status       string `json:"status"`
}

// decibels rounds a level to 0.01 dB; NaN and ±Inf stay (written as null).
func decibels(v float64) num { return num(roundTo(v, levelDecimals)) }

func newCrewDocs(p *planner.Plan) []crewDoc {
	out := make([]crewDoc, len(p.Crew))
	for i, e := range p.Crew {
		status, _ := verdictName(e.Status)
		out[i] = crewDoc{Name: e.Name, Point: e.Point, AWeighted: decibels(e.AWeighted), Peak: decibels(e.Peak),
			AllowedHours: sig(e.AllowedHours), Status: status}
	}
	return out
}
