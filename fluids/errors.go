package fluids

import "errors"

// Sentinel errors. Functions wrap them with the offending value, so check
// them with errors.Is.
var (
	// ErrNotFinite: an input was NaN or infinite.
	ErrNotFinite = errors.New("value is not a finite number")
	// ErrBelowFreezing: a temperature below the fluid's freezing (triple)
	// point, where the liquid correlations have no meaning.
	ErrBelowFreezing = errors.New("temperature is below the freezing point")
	// ErrSupercritical: a saturation property was asked above the critical
	// temperature, where liquid and vapour no longer exist apart.
	ErrSupercritical = errors.New("temperature is above the critical temperature")
	// ErrTwoPhase: a single-phase property was asked at a temperature and
	// density inside the two-phase region.
	ErrTwoPhase = errors.New("state lies inside the two-phase region")
	// ErrOutOfDomain: a pressure or density outside what the equations
	// describe (for example a liquid below its saturation pressure).
	ErrOutOfDomain = errors.New("outside the range the correlations describe")
	// ErrUnknownFluid: no fluid in the library matches the name given.
	ErrUnknownFluid = errors.New("no such fluid in the library")
	// ErrInvalidFluid: a fluid record failed validation.
	ErrInvalidFluid = errors.New("invalid fluid data")
)
