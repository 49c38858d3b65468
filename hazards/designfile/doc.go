// Package designfile reads and writes Ullage design files: one product and
// the history of its revisions, each revision a complete hazards.Design,
// in a JSON format meant to be read and, at a pinch, edited by a person.
// Every number is SI and its unit is spelled in the field name
// (fill_mass_kg, hottest_k, ...), exactly as in hazards.Design.
//
// A file in the current format looks like this (design abridged):
//
//	{
//	  "format": "ullage-design/2",
//	  "product": {"name": "...", "part_number": "...", "company": "...", "description": "..."},
//	  "revisions": [
//	    {"label": "A", "date": "2024-03-04", "author": "...", "change_note": "...",
//	     "design": {"fluid": "dichloromethane", "fill_mass_kg": 0.006, ...}}
//	  ]
//	}
//
// Revisions are listed oldest first. Loading is strict: unknown or missing
// fields, values of the wrong type or out of range and oversized files are
// refused with an error naming the file, the line and the field path. The
// older single-design sheet (FormatSingleSheet) is migrated on load; only
// FormatCurrent is ever written. Save replaces a file atomically and keeps
// the previous version beside it as "<path>.bak".
package designfile
