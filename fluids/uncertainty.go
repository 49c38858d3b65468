package fluids

// Uncertainty returns the stated uncertainty of one property (one of the
// Property* names): the reference equation of state's, where the fluid
// has one, else the record's own statement for its correlations. ok is
// false when no uncertainty is stated for the property.
func (s *Substance) Uncertainty(property string) (u Uncertainty, ok bool) {
	for _, x := range s.Uncertainties() {
		if x.Property == property {
			return x, true
		}
	}
	return Uncertainty{}, false
}

// Uncertainties returns every stated property uncertainty, in the order
// the data give them. Callers must not modify the result.
func (s *Substance) Uncertainties() []Uncertainty {
	if s.ref != nil {
		return s.ref.file.Uncertainty
	}
	return s.fluid.Uncertainty
}

// Route names where the substance's properties come from: the reference
// equation of state by its paper, or the record's correlations.
func (s *Substance) Route() string {
	if s.ref != nil {
		return "reference equation of state: " + s.ref.file.Name + " — " + s.ref.file.Paper.Citation()
	}
	return "correlations given in the fluid record"
}

// BuiltinSubstanceOf returns the built-in library's substance whose
// record is f (the same record, not merely the same id), or nil for a
// user-supplied or unknown record. It lets code that holds only a record,
// such as a report, ask which route and equation its properties took.
func BuiltinSubstanceOf(f *Fluid) *Substance {
	if f == nil || f.UserSupplied {
		return nil
	}
	lib, err := Builtin()
	if err != nil {
		return nil
	}
	for _, s := range lib.substances {
		if s.fluid == f {
			return s
		}
	}
	return nil
}
