import { productParams } from "@/lib/catalogue/schema";
import { deleteProduct } from "@/lib/catalogue/service";
import { memberRoute } from "@/lib/http/handler";

/** Removes a product from the catalogue; panels taken from it keep their values. */
export const DELETE = memberRoute("catalogue:write", { params: productParams, status: 204 }, ({ member, params }) => deleteProduct(member, params.productId));
