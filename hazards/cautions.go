package hazards

// StandardCautions are printed with every result: the tool's numbers
// support a review, they do not replace one. The cautions a fluid calls
// for are worded from its typed data by the display layer
// (report/display.Cautions).
var StandardCautions = []string{
	"This assessment is an engineering estimate from published correlations and simple models. It does not certify a product. Local codes, the applicable product-safety, toy and pressure-equipment standards, and the judgement of qualified, licensed professionals take precedence.",
	"Test real units: burst, thermal-cycling and drop tests on production samples are needed to confirm the glass strength assumed here, which depends on surface damage, residual stress from flame sealing and annealing quality that no calculation can see.",
	"Flame-sealed tips, joints and thickness changes concentrate stress; the membrane formulas used here do not capture them.",
	"Exposure limits apply to healthy adult workers. Children, the unwell and the public may need lower levels; consult the responsible authority.",
	"The release models assume the whole fill evaporates at once and spreads as the chosen room model describes; real rooms, spills onto fabric and heat sources can give higher local concentrations.",
}
