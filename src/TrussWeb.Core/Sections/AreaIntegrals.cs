namespace TrussWeb.Core.Sections;

/// <summary>
/// Accumulates the area integrals of a plane figure built from signed rectangles and quarter discs,
/// all about the global origin: A = ∫dA, Qx = ∫x dA, Qy = ∫y dA, Ixx0 = ∫x² dA, Iyy0 = ∫y² dA,
/// Ixy0 = ∫xy dA (mm, mm², mm³, mm⁴). Exact closed forms for each primitive (no numerical
/// integration), so outlines with fillets and rounded corners are computed exactly.
/// </summary>
internal sealed class AreaIntegrals
{
    public double Area { get; private set; }

    /// <summary>∫x dA, mm³.</summary>
    public double FirstMomentX { get; private set; }

    /// <summary>∫y dA, mm³.</summary>
    public double FirstMomentY { get; private set; }

    /// <summary>∫x² dA about the origin, mm⁴.</summary>
    public double SecondMomentXX { get; private set; }

    /// <summary>∫y² dA about the origin, mm⁴.</summary>
    public double SecondMomentYY { get; private set; }

    /// <summary>∫xy dA about the origin, mm⁴.</summary>
    public double ProductXY { get; private set; }

    public double CentroidX => FirstMomentX / Area;

    public double CentroidY => FirstMomentY / Area;

    /// <summary>∫(y - yc)² dA: second moment about the centroidal axis parallel to x, mm⁴.</summary>
    public double CentroidalIx => SecondMomentYY - Area * CentroidY * CentroidY;

    /// <summary>∫(x - xc)² dA: second moment about the centroidal axis parallel to y, mm⁴.</summary>
    public double CentroidalIy => SecondMomentXX - Area * CentroidX * CentroidX;

    /// <summary>∫(x - xc)(y - yc) dA, mm⁴.</summary>
    public double CentroidalIxy => ProductXY - Area * CentroidX * CentroidY;

    /// <summary>Adds (sign = +1) or removes (sign = -1) the rectangle [x1, x2] × [y1, y2].</summary>
    public void AddRectangle(double x1, double x2, double y1, double y2, int sign = 1)
    {
        var w = x2 - x1;
        var h = y2 - y1;
        Area += sign * w * h;
        FirstMomentX += sign * (x2 * x2 - x1 * x1) / 2 * h;
        FirstMomentY += sign * (y2 * y2 - y1 * y1) / 2 * w;
        SecondMomentXX += sign * (x2 * x2 * x2 - x1 * x1 * x1) / 3 * h;
        SecondMomentYY += sign * (y2 * y2 * y2 - y1 * y1 * y1) / 3 * w;
        ProductXY += sign * (x2 * x2 - x1 * x1) / 2 * (y2 * y2 - y1 * y1) / 2;
    }

    /// <summary>
    /// Adds or removes the quarter disc of radius <paramref name="r"/> centred at (cx, cy) lying in
    /// the quadrant (qx, qy) ∈ {-1, +1}² from its centre. About its centre: A = πr²/4,
    /// ∫ξ dA = qx r³/3, ∫ξ² dA = πr⁴/16, ∫ξη dA = qx qy r⁴/8; moved to the origin by the parallel-axis
    /// relations.
    /// </summary>
    public void AddQuarterDisc(double cx, double cy, double r, int qx, int qy, int sign = 1)
    {
        var a = Math.PI * r * r / 4;
        var fx = qx * r * r * r / 3;
        var fy = qy * r * r * r / 3;
        var i = Math.PI * r * r * r * r / 16;
        var p = qx * qy * r * r * r * r / 8;
        Area += sign * a;
        FirstMomentX += sign * (fx + cx * a);
        FirstMomentY += sign * (fy + cy * a);
        SecondMomentXX += sign * (i + 2 * cx * fx + cx * cx * a);
        SecondMomentYY += sign * (i + 2 * cy * fy + cy * cy * a);
        ProductXY += sign * (p + cx * fy + cy * fx + cx * cy * a);
    }

    /// <summary>
    /// Adds or removes a fillet "spandrel": the square of side r with one corner at (cornerX, cornerY)
    /// extending in the direction (dx, dy) ∈ {-1, +1}², less the quarter disc centred at the square's
    /// far corner. Its area is r²(1 - π/4). Used for a root fillet (added) and for rounded toes and
    /// rounded corners (removed).
    /// </summary>
    public void AddSpandrel(double cornerX, double cornerY, double r, int dx, int dy, int sign = 1)
    {
        if (r <= 0)
        {
            return;
        }

        var farX = cornerX + dx * r;
        var farY = cornerY + dy * r;
        AddRectangle(Math.Min(cornerX, farX), Math.Max(cornerX, farX), Math.Min(cornerY, farY), Math.Max(cornerY, farY), sign);
        AddQuarterDisc(farX, farY, r, -dx, -dy, -sign);
    }

    /// <summary>
    /// Adds or removes a rectangle [x1, x2] × [y1, y2] whose four corners are rounded with radius r
    /// (r = 0: sharp). Area = w h - (4 - π) r².
    /// </summary>
    public void AddRoundedRectangle(double x1, double x2, double y1, double y2, double r, int sign = 1)
    {
        AddRectangle(x1, x2, y1, y2, sign);
        AddSpandrel(x1, y1, r, 1, 1, -sign);
        AddSpandrel(x2, y1, r, -1, 1, -sign);
        AddSpandrel(x1, y2, r, 1, -1, -sign);
        AddSpandrel(x2, y2, r, -1, -1, -sign);
    }
}
