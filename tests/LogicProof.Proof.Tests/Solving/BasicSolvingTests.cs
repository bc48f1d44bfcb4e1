using Microsoft.Z3;

namespace LogicProof.Proof.Tests.Solving;

public sealed class BasicSolvingTests
{
    [Fact]
    public void Check_WhenBitVectorEquationHasSolution_ReturnsSatisfiableWithModelValue()
    {
        using var ctx = Z3TestContext.Create();
        var x = ctx.MkBVConst("x", 8);
        using var solver = ctx.MkSolver();
        solver.Add(ctx.MkEq(ctx.MkBVAdd(x, ctx.MkBV(3, 8)), ctx.MkBV(1, 8)));

        Assert.Equal(Status.SATISFIABLE, solver.Check());

        var value = (BitVecNum)solver.Model.Eval(x, true);
        Assert.Equal(254u, value.UInt);
    }

    [Fact]
    public void Check_WhenBitVectorConstraintsContradict_ReturnsUnsatisfiable()
    {
        using var ctx = Z3TestContext.Create();
        var x = ctx.MkBVConst("x", 4);
        using var solver = ctx.MkSolver();
        solver.Add(ctx.MkBVUGT(x, ctx.MkBV(14, 4)));
        solver.Add(ctx.MkNot(ctx.MkEq(x, ctx.MkBV(15, 4))));

        Assert.Equal(Status.UNSATISFIABLE, solver.Check());
    }

    [Fact]
    public void Check_WhenIntegerSystemHasSolution_ReturnsSatisfiableWithModelValues()
    {
        using var ctx = Z3TestContext.Create();
        var a = ctx.MkIntConst("a");
        var b = ctx.MkIntConst("b");
        using var solver = ctx.MkSolver();
        solver.Add(ctx.MkEq(ctx.MkAdd(a, b), ctx.MkInt(10)));
        solver.Add(ctx.MkEq(ctx.MkSub(a, b), ctx.MkInt(4)));

        Assert.Equal(Status.SATISFIABLE, solver.Check());

        Assert.Equal(7, ((IntNum)solver.Model.Eval(a, true)).Int);
        Assert.Equal(3, ((IntNum)solver.Model.Eval(b, true)).Int);
    }

    [Fact]
    public void Check_WhenIntegerParityContradicts_ReturnsUnsatisfiable()
    {
        using var ctx = Z3TestContext.Create();
        var a = ctx.MkIntConst("a");
        using var solver = ctx.MkSolver();
        solver.Add(ctx.MkEq(ctx.MkMul(ctx.MkInt(2), a), ctx.MkInt(7)));

        Assert.Equal(Status.UNSATISFIABLE, solver.Check());
    }

    [Fact]
    public void Check_WhenAssumptionsConflict_ReportsThemInUnsatCore()
    {
        using var ctx = Z3TestContext.Create();
        var x = ctx.MkBVConst("x", 8);
        var p = ctx.MkBoolConst("p");
        var q = ctx.MkBoolConst("q");
        var r = ctx.MkBoolConst("r");
        using var solver = ctx.MkSolver();
        solver.Add(ctx.MkImplies(p, ctx.MkEq(x, ctx.MkBV(5, 8))));
        solver.Add(ctx.MkImplies(q, ctx.MkBVUGT(x, ctx.MkBV(5, 8))));

        Assert.Equal(Status.SATISFIABLE, solver.Check(p, r));
        Assert.Equal(Status.UNSATISFIABLE, solver.Check(p, q, r));

        var core = solver.UnsatCore.Select(e => e.ToString()).Order(StringComparer.Ordinal);
        Assert.Equal(["p", "q"], core);
    }

    [Fact]
    public void DeclKind_OfConstantsAndOperators_UsesManagedNumbering()
    {
        using var ctx = Z3TestContext.Create();
        var a = ctx.MkBoolConst("a");
        var b = ctx.MkBoolConst("b");
        var n = ctx.MkIntConst("n");

        Assert.Equal(Z3_decl_kind.Z3_OP_UNINTERPRETED, a.FuncDecl.DeclKind);
        Assert.Equal(Z3_decl_kind.Z3_OP_AND, ctx.MkAnd(a, b).FuncDecl.DeclKind);
        Assert.True(ctx.MkLe(n, ctx.MkInt(3)).IsLE);
        Assert.True(ctx.MkBVAdd(ctx.MkBVConst("v", 4), ctx.MkBV(1, 4)).IsBVAdd);
    }
}
